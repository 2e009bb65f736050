import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProviders, createAppQueryClient } from './providers';
import { createAppRouter } from './router';

/** The workshop app (every address but /deck): router, server-state cache, all screens. */
export function renderWorkshopApp(container: HTMLElement) {
  const queryClient = createAppQueryClient();
  const router = createAppRouter(queryClient);
  createRoot(container).render(
    <StrictMode>
      <AppProviders queryClient={queryClient}>
        <RouterProvider router={router} />
      </AppProviders>
    </StrictMode>,
  );
}
