import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import '@fontsource-variable/atkinson-hyperlegible-next';
import '@fontsource-variable/atkinson-hyperlegible-mono';
import './styles/app.css';
import { AppProviders, createAppQueryClient } from './app/providers';
import { createAppRouter } from './app/router';
import { applyDisplayMode, readDisplayMode, watchSystemScheme } from './lib/display-mode';

applyDisplayMode(readDisplayMode());
watchSystemScheme();

const queryClient = createAppQueryClient();
const router = createAppRouter(queryClient);

const container = document.getElementById('root');
if (!container) throw new Error('Ringseat: the page has no #root element.');

createRoot(container).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
