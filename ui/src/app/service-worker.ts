/// <reference types="vite-plugin-pwa/client" />
import { registerSW } from 'virtual:pwa-register';

/**
 * Registers the service worker of the built app (vite-plugin-pwa, workbox): the app shell stays
 * on the device so the field-record form opens offline. Not in development, where Vite serves
 * modules one by one and a cached shell would hide changes.
 */
export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  registerSW({ immediate: true });
}
