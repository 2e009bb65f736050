import type { ComponentProps } from 'react';

/** A clipboard with a ticked line and an open one: runs waiting to be checked and signed. */
export function RunsIcon(props: ComponentProps<'svg'>) {
  return (
    <svg
      viewBox="0 0 24 24"
      width="24"
      height="24"
      fill="none"
      stroke="currentColor"
      strokeWidth="2"
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      {...props}
    >
      <path d="M8 4H6a1 1 0 0 0-1 1v15a1 1 0 0 0 1 1h12a1 1 0 0 0 1-1V5a1 1 0 0 0-1-1h-2" />
      <rect x="8" y="2.5" width="8" height="3.5" rx="1" />
      <path d="M8 11l1.5 1.5L12 10M14 11.5h2M8 16.5h8" />
    </svg>
  );
}
