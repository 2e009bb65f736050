import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { isApiError } from '../../lib/api-client';
import { Button, buttonClass } from '../../components/ui/button';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error) && error.status === 404) {
    return { title: 'Page not found', detail: 'There is no page at this address.' };
  }
  if (isApiError(error)) {
    return { title: error.isNetworkError ? 'No connection' : 'The server could not answer', detail: error.message };
  }
  // A chunk that fails to load usually means a newer version of the app was installed.
  if (error instanceof TypeError && /dynamically imported module|Importing a module script/i.test(error.message)) {
    return { title: 'Ringseat was updated', detail: 'Reload the page to get the new version.' };
  }
  return { title: 'Something went wrong', detail: 'This page stopped working. Try again, or go back to the start.' };
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
