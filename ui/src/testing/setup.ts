import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// Mantine pages take a while to mount in jsdom on a busy machine; 1 s is too tight.
configure({ asyncUtilTimeout: 5000 });

// jsdom lacks a few browser APIs that Mantine calls.
const { getComputedStyle } = window;
window.getComputedStyle = (elt: Element) => getComputedStyle(elt);

Object.defineProperty(window, 'matchMedia', {
  writable: true,
  value: (query: string) => ({
    matches: false,
    media: query,
    onchange: null,
    addListener: () => {},
    removeListener: () => {},
    addEventListener: () => {},
    removeEventListener: () => {},
    dispatchEvent: () => false,
  }),
});

class ResizeObserverShim {
  observe() {}
  unobserve() {}
  disconnect() {}
}
window.ResizeObserver = ResizeObserverShim as unknown as typeof ResizeObserver;
globalThis.ResizeObserver = window.ResizeObserver;

Element.prototype.scrollIntoView = () => {};

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});
