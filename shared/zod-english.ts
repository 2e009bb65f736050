import { config } from 'zod/mini';
import { en } from 'zod/locales';

/*
 * Classic zod registers its English messages when it builds its first schema; zod/mini leaves
 * that to the app and says only "Invalid input" otherwise. The deck-path schemas are on
 * zod/mini, and a check without a message of its own must read the same as it did on classic,
 * wherever the schema runs (a deck bundle without classic zod, the server, the tests). So every
 * zod/mini schema module imports this first. A locale the app chose itself is left alone.
 */
if (!config().localeError) config(en());
