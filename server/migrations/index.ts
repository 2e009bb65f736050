import { Foundation1796161893549 } from './1796161893549-Foundation.js';

/** Migrations in the order they run. Add each new file here (the generator does not). */
export const MIGRATIONS: Function[] = [Foundation1796161893549];
