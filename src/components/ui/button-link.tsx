import { Link, type LinkProps } from 'react-router-dom';
import { buttonClass, type ButtonVariant } from './button';

/** A router link that looks like a button (kept apart from Button so the deck loads no router). */
export function ButtonLink({
  variant = 'primary',
  className,
  ...rest
}: LinkProps & { variant?: ButtonVariant }) {
  return <Link className={buttonClass(variant, className)} {...rest} />;
}
