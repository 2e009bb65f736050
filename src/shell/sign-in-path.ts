/** Where to sign in, coming back to `path` afterwards. */
export function signInPath(path: string): string {
  return path === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(path)}`;
}

/** Only same-site paths are followed after sign-in, never another site ("//host" or "https:"). */
export function safeNextPath(next: string | null): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  return next;
}
