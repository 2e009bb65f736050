import type { ComponentProps } from 'react';
import { cx } from './cx';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet';
type Variant = ButtonVariant;

const base =
  'inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-md px-4 font-semibold ' +
  'whitespace-nowrap disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<Variant, string> = {
  primary: 'bg-accent text-accent-ink hover:opacity-90',
  secondary: 'border-2 border-ink bg-surface text-ink hover:bg-sunk',
  quiet: 'text-ink underline-offset-4 hover:underline',
};

export const buttonClass = (variant: Variant = 'primary', className?: string) =>
  cx(base, variants[variant], className);

interface ButtonProps extends ComponentProps<'button'> {
  variant?: Variant;
  /** While true the button is disabled and shows `pendingLabel` instead of its children. */
  pending?: boolean;
  pendingLabel?: string;
}

export function Button({
  variant = 'primary',
  pending,
  pendingLabel,
  className,
  children,
  disabled,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClass(variant, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending && pendingLabel ? pendingLabel : children}
    </button>
  );
}
