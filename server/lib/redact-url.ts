/**
 * A request's address as the logs may keep it: the secret part of an invite link (and of any
 * other link that works by knowing it) is replaced, so reading the logs never lets anyone in.
 */
const SECRET_SEGMENTS = /\/(invites?|password-resets?|reset-password)\/[^/?#]+/gi;

export const redactUrl = (url: string | undefined): string | undefined =>
  url?.replace(SECRET_SEGMENTS, '/$1/[token]');
