/** A same-site path to return to after sign-in; anything else (other hosts, `//x`) becomes `/`. */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  if (next.startsWith('/sign-in')) return '/';
  return next;
}

/** The sign-in URL that comes back to `path` afterwards. */
export function signInUrl(path: string): string {
  const next = safeNext(path);
  return next === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(next)}`;
}
