import { Link } from 'react-router';

export function NotFoundPage({ message = 'There is no page at this address.' }: { message?: string }) {
  return (
    <div className="mx-auto max-w-md py-10 text-center">
      <title>Not found · Skinwright</title>
      <p className="num text-ink-muted">404</p>
      <h1 className="mt-2 text-3xl">Not found</h1>
      <p className="mt-3">{message}</p>
      <p className="mt-6">
        <Link to="/projects">Go to your projects</Link>
      </p>
    </div>
  );
}
