import { Argon2id } from 'oslo/password';

// Argon2id with oslo's defaults (19 MiB memory, 2 passes: the OWASP password storage cheat sheet's
// first recommended setting, from memory).
const argon2id = new Argon2id();

export const hashPassword = (password: string) => argon2id.hash(password);
export const verifyPassword = (hash: string, password: string) => argon2id.verify(hash, password);
