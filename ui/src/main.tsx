import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
// Self-hosted fonts, Latin subset only, just the weights in use.
import '@fontsource/inter/latin-400.css';
import '@fontsource/inter/latin-500.css';
import '@fontsource/inter/latin-600.css';
import '@fontsource/inter/latin-700.css';
import '@fontsource/jetbrains-mono/latin-400.css';
import '@fontsource/jetbrains-mono/latin-500.css';
import '@mantine/core/styles.css';
import '@mantine/notifications/styles.css';
import '@mantine/dropzone/styles.css';
// Chart styles are CSS only; the chart code itself is loaded lazily where a chart is shown.
import '@mantine/charts/styles.css';
import './app/global.css';
import { App } from './app/app';
import { registerServiceWorker } from './app/service-worker';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <App />
  </StrictMode>,
);

registerServiceWorker();
