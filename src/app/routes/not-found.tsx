import { useLocation } from 'react-router-dom';
import { ButtonLink } from '../../components/ui/button-link';
import { useSessionUser } from '../shell/session';

export function NotFoundRoute() {
  const { pathname } = useLocation();
  const user = useSessionUser();
  const home = user.role === 'skipper' ? 'Go to your vessels' : 'Go to the workshop';
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <title>Page not found · Ringseat</title>
      <h1 className="text-3xl font-bold">Page not found</h1>
      <p>
        Ringseat has no page at <code className="figures break-all">{pathname}</code>. The link may
        be mistyped, or the page may have moved.
      </p>
      <ButtonLink to="/" className="self-start">
        {home}
      </ButtonLink>
    </div>
  );
}

export { NotFoundRoute as Component };
