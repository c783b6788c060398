import type { ComponentType, ReactNode } from 'react';
import { Navigate, useSearchParams } from 'react-router';
import { useMe } from '../../features/me/api/get-me';
import { safeNext } from '../../lib/safe-next';

/** A narrow page for the sign-in screens. */
export function AuthPageFrame({
  title,
  intro,
  children,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
}) {
  return (
    <div className="mx-auto max-w-md">
      <title>{`${title} · Skinwright`}</title>
      <h1 className="border-b border-ink pb-3 text-3xl">{title}</h1>
      {intro ? <p className="mt-3 text-ink-muted">{intro}</p> : null}
      <div className="mt-6">{children}</div>
    </div>
  );
}

/**
 * A sign-in screen for someone not signed in yet (sign in, create an account): its form goes on to `?next=`
 * (when it is a path of this site) and starts from `?email=`; a person already signed in goes there at once.
 */
export function SignedOutPage({
  title,
  intro,
  Form,
}: {
  title: string;
  intro: ReactNode;
  Form: ComponentType<{ next: string; defaultEmail: string }>;
}) {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <AuthPageFrame title={title} intro={intro}>
      <Form next={next} defaultEmail={params.get('email') ?? ''} />
    </AuthPageFrame>
  );
}
