import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { notifications } from '@mantine/notifications';
import { afterEach, vi } from 'vitest';
import { sessionStore } from '../lib/session';

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

// Test files share one module graph and one jsdom (isolate: false in vitest.config.ts), so what a
// test leaves in module-level stores or browser storage would reach the next file: Mantine keeps
// its toasts in a module store that outlives the unmounted <Notifications />.
afterEach(() => {
  cleanup();
  notifications.clean();
  sessionStore.reset();
  localStorage.clear();
  sessionStorage.clear();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});
