import type { ComponentProps } from 'react';
import { buttonClass, type ButtonVariant } from '../../../components/ui/button';
import { followDeckLink } from '../deck-navigation';

type DeckLinkProps = Omit<ComponentProps<'a'>, 'href'> & { to: string };

/** A link between deck pages (see deck-navigation.ts); elsewhere it loads the page. */
export function DeckLink({ to, onClick, ...rest }: DeckLinkProps) {
  return (
    <a
      href={to}
      {...rest}
      onClick={(event) => {
        onClick?.(event);
        followDeckLink(event, to);
      }}
    />
  );
}

export function DeckButtonLink({
  variant = 'primary',
  className,
  ...rest
}: DeckLinkProps & { variant?: ButtonVariant }) {
  return <DeckLink className={buttonClass(variant, className)} {...rest} />;
}
