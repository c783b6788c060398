/**
 * Where to go after signing in. Only same-site paths are honoured ("/projects/…"), never "//evil.example"
 * or "https://…", so the `next` parameter cannot be used to send someone elsewhere.
 */
export function safeNext(next: string | null | undefined, fallback = '/projects'): string {
  if (!next) return fallback;
  if (!next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  return next;
}

export function signInPath(next: string): string {
  return `/sign-in?next=${encodeURIComponent(next)}`;
}
