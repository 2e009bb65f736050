import type { ReactNode } from 'react';
import { Button } from '../components/ui/button';

/** The signed-in page of either app: skip link, header, then the page. */
export function PageFrame({ header, children }: { header: ReactNode; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-40 focus:bg-surface focus:p-3"
      >
        Skip to content
      </a>
      {header}
      <main
        id="main"
        className="mx-auto w-full max-w-6xl flex-1 px-3 pb-bottom-bar pt-4 sm:px-5 sm:pb-10 sm:pt-6"
      >
        {children}
      </main>
    </div>
  );
}

/** What went wrong, a way to try again and, from the app that shows it, a way back. */
export function ProblemPanel({
  title,
  detail,
  back,
}: {
  title: string;
  detail: string;
  back: ReactNode;
}) {
  return (
    <div role="alert" className="mx-auto flex max-w-xl flex-col gap-4 px-3 py-10">
      <h1 className="text-2xl font-bold">{title}</h1>
      <p>{detail}</p>
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => window.location.reload()}>Try again</Button>
        {back}
      </div>
    </div>
  );
}
