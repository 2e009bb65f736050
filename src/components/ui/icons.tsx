import type { ComponentProps } from 'react';

type IconProps = ComponentProps<'svg'>;

/** Simple stroked icons drawn for Ringseat; they inherit the text colour of the display mode. */
function Icon({ children, ...rest }: IconProps) {
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
      {...rest}
    >
      {children}
    </svg>
  );
}

/** The product mark: a piston ring with its end gap, and a gauge needle. */
export function RingMark(props: IconProps) {
  return (
    <svg viewBox="0 0 64 64" width="32" height="32" aria-hidden="true" focusable="false" {...props}>
      <circle
        cx="32"
        cy="33"
        r="18"
        fill="none"
        stroke="var(--rs-accent)"
        strokeWidth="7"
        strokeDasharray="103.1 10"
        strokeDashoffset="23.3"
      />
      <path d="M32 33 L43 22" stroke="var(--rs-ink)" strokeWidth="4" strokeLinecap="round" />
      <circle cx="32" cy="33" r="4" fill="var(--rs-ink)" />
    </svg>
  );
}

export const HullIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M3 14h18l-3 5H6z" />
    <path d="M12 14V4l6 8h-6" />
  </Icon>
);
export const WrenchIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M14.5 6.5a4 4 0 0 0 5 5L12 19a2.1 2.1 0 0 1-3-3z" />
    <path d="M14.5 6.5 17 4l3 3-2.5 2.5" />
  </Icon>
);
export const PeopleIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="9" cy="8" r="3.5" />
    <path d="M2.5 20a6.5 6.5 0 0 1 13 0" />
    <path d="M16 4.5a3.5 3.5 0 0 1 0 7M18 14a6.5 6.5 0 0 1 3.5 6" />
  </Icon>
);
export const SunIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="12" r="4" />
    <path d="M12 2v2M12 20v2M4.9 4.9l1.4 1.4M17.7 17.7l1.4 1.4M2 12h2M20 12h2M4.9 19.1l1.4-1.4M17.7 6.3l1.4-1.4" />
  </Icon>
);
export const MoonIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M20 14.5A8 8 0 0 1 9.5 4 8 8 0 1 0 20 14.5z" />
  </Icon>
);
export const HalfIcon = (p: IconProps) => (
  <Icon {...p}>
    <circle cx="12" cy="12" r="9" />
    <path d="M12 3v18a9 9 0 0 0 0-18z" fill="currentColor" />
  </Icon>
);
export const ExitIcon = (p: IconProps) => (
  <Icon {...p}>
    <path d="M15 4h4v16h-4" />
    <path d="M10 8l-4 4 4 4M6 12h10" />
  </Icon>
);
