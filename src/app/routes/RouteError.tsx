import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { Notice } from '../../components/ui/Notice';
import { errorMessage, isApiRequestError } from '../../lib/api';
import { NotFoundPage } from './NotFoundPage';

/** What a page shows when its loader or render fails: not found, not allowed, or a plain failure. */
export function RouteError() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : isApiRequestError(error) ? error.status : 0;
  const detail = isRouteErrorResponse(error) && typeof error.data === 'string' ? error.data : undefined;

  if (status === 404) {
    const message = isApiRequestError(error)
      ? 'There is nothing at this address, or you are not a member of the project it belongs to.'
      : detail;
    return <NotFoundPage message={message} />;
  }
  if (status === 403) {
    return (
      <div className="mx-auto max-w-md py-10">
        <title>Not allowed · Skinwright</title>
        <h1 className="text-3xl">Not allowed</h1>
        <p className="mt-3">
          {detail ?? 'Your account or your role on this project does not open this page.'}
        </p>
        <p className="mt-6">
          <Link to="/projects">Go to your projects</Link>
        </p>
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-xl py-10">
      <title>Something went wrong · Skinwright</title>
      <h1 className="text-3xl">Something went wrong</h1>
      <Notice tone="caution" title={detail ?? errorMessage(error)} className="mt-4">
        <p>
          Try again in a moment. If it keeps happening, tell whoever runs this installation what you were
          doing.
        </p>
      </Notice>
      <p className="mt-6">
        <Link to="/projects">Go to your projects</Link>
      </p>
    </div>
  );
}
