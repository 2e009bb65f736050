import type { ReactNode } from 'react';
import { ButtonLink } from '../../components/ui/button-link';
import { useSessionUser } from '../shell/session';

/** Workshop pages: a skipper who follows a link here is told so and sent back to their boats. */
export function StaffOnly({ title, children }: { title: string; children: ReactNode }) {
  const user = useSessionUser();
  if (user.role !== 'skipper') return <>{children}</>;
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <h1 className="text-3xl font-bold">{title}</h1>
      <p>
        This page is for the workshop&rsquo;s staff. Your own vessels and their engines are on your
        start page.
      </p>
      <ButtonLink to="/" variant="secondary" className="self-start">
        Go to your vessels
      </ButtonLink>
    </div>
  );
}
