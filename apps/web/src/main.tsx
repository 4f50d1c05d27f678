import '@fontsource/roboto/400.css';
import '@fontsource/roboto/500.css';
import '@fontsource/roboto/700.css';
import '@blueprintjs/core/lib/css/blueprint.css';
import './styles/theme.css';
import './styles/field.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/app';
import { configureIcons } from './app/icons';
import { registerServiceWorker } from './lib/service-worker';

configureIcons();
createRoot(document.getElementById('root') as HTMLElement).render(
  <StrictMode>
    <App />
  </StrictMode>,
);

registerServiceWorker();
