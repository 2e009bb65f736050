import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { describeError } from './error-words';
import { Button, buttonClass } from '../../components/ui/button';

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
    <div role="alert" className="mx-auto flex max-w-xl flex-col gap-4 px-3 py-10">
      <h1 className="text-2xl font-bold">{title}</h1>
      <p>{detail}</p>
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => window.location.reload()}>Try again</Button>
        <Link to="/" className={buttonClass('secondary')}>Back to the start</Link>
      </div>
    </div>
  );
}
