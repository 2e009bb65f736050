import type { ComponentProps, ReactNode } from 'react';

/**
 * A checkbox drawn in the display mode's own colours: the native one is painted grey in dark
 * colour schemes, which breaks the night palette.
 */
export function Checkbox({
  children,
  ...input
}: Omit<ComponentProps<'input'>, 'type'> & { children: ReactNode }) {
  return (
    <label className="flex min-h-touch cursor-pointer items-center gap-3">
      <input type="checkbox" className="peer sr-only" {...input} />
      <span
        aria-hidden="true"
        className="flex size-6 shrink-0 items-center justify-center rounded border-2 border-ink bg-surface text-accent-ink peer-checked:bg-accent peer-checked:[&>svg]:visible peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus"
      >
        <svg
          viewBox="0 0 24 24"
          className="invisible size-5"
          fill="none"
          stroke="currentColor"
          strokeWidth="3.5"
          strokeLinecap="round"
          strokeLinejoin="round"
        >
          <path d="M5 12.5l4.5 4.5L19 7.5" />
        </svg>
      </span>
      <span>{children}</span>
    </label>
  );
}
