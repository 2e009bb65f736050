import { createHash, randomBytes } from 'node:crypto';

/** A random URL-safe token with 256 bits of entropy. */
export const newToken = () => randomBytes(32).toString('base64url');

/** Tokens are stored hashed; SHA-256 is enough for random 256-bit secrets (no guessing to slow down). */
export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
