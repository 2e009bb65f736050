import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { DeckApp } from './deck-app';

export function renderDeckApp(container: HTMLElement) {
  createRoot(container).render(
    <StrictMode>
      <DeckApp />
    </StrictMode>,
  );
}
