import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { describeError } from '../../shell/error-words';
import { buttonClass } from '../../components/ui/button';
import { ProblemPanel } from '../../shell/page-frame';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error) && error.status === 404) {
    return { title: 'Page not found', detail: 'There is no page at this address.' };
  }
  return describeError(error);
}

/** The error element of every route: says what happened and always offers a way back. */
export function RouteError() {
  const { title, detail } = describe(useRouteError());
  return (
    <ProblemPanel
      title={title}
      detail={detail}
      back={
        <Link to="/" className={buttonClass('secondary')}>
          Back to the start
        </Link>
      }
    />
  );
}
