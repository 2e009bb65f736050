import type { ReactNode } from 'react';
import { RingMark } from '../../components/ui/icons';
import { DisplayModeMenu } from '../../shell/display-mode-menu';

/** The frame of the pages used before signing in: the mark, the display mode and one panel. */
export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="flex items-center justify-between gap-3 px-3 py-2 sm:px-5">
        <p className="flex items-center gap-2 text-xl font-bold">
          <RingMark />
          <span>Ringseat</span>
        </p>
        <DisplayModeMenu />
      </header>
      <main id="main" className="flex flex-1 items-start justify-center px-3 pb-10 pt-6 sm:pt-16">
        <div className="w-full max-w-md rounded-lg border-2 border-line bg-surface p-5 sm:p-7">
          <h1 className="mb-5 text-2xl font-bold">{title}</h1>
          {children}
        </div>
      </main>
    </div>
  );
}
