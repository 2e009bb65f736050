import 'reflect-metadata';
import { parseArgs } from 'node:util';
import { NewWorkshopSchema, createWorkshop } from '../features/team/create-workshop.js';
import { syncBuiltInPrograms } from '../features/programs/programs.service.js';
import { loadConfig } from '../lib/config.js';
import { openDatabase } from '../lib/database.js';

/*
 * npm run db:create-workshop -- --workshop "Name" --email manager@example.org [--timezone Europe/Oslo]
 * Creates the database when there is none (with its migrations), a workshop in it and an invite
 * for its first manager, and prints the invite link to open in a browser.
 */

const USAGE =
  'Usage: npm run db:create-workshop -- --workshop "Your workshop" --email manager@example.org [--timezone Europe/Oslo]';

function fail(message: string): never {
  console.error(`${message}\n${USAGE}`);
  process.exit(2);
}

function readInput() {
  let values: Record<string, string | boolean | undefined>;
  try {
    ({ values } = parseArgs({
      options: {
        workshop: { type: 'string' },
        email: { type: 'string' },
        timezone: { type: 'string' },
      },
    }));
  } catch (error) {
    fail((error as Error).message);
  }
  const parsed = NewWorkshopSchema.safeParse(values);
  if (!parsed.success)
    fail(parsed.error.issues.map((i) => `--${i.path.join('.')}: ${i.message}`).join('\n'));
  return parsed.data;
}

const input = readInput();
const config = loadConfig();
const dataSource = await openDatabase(config.databasePath);
try {
  const { name, token, expiresAt, created } = await createWorkshop(dataSource, input, new Date());
  await syncBuiltInPrograms(dataSource);
  const origin = config.publicOrigin ?? `http://localhost:${config.port}`;
  console.log(
    [
      created
        ? `${config.databasePath}: workshop "${name}" created.`
        : `${config.databasePath}: workshop "${name}" has no manager yet; here is a new link (earlier links still work until they expire).`,
      `Its first manager (${input.email}) sets a password and signs in at this link, valid until ${expiresAt.toISOString()}:`,
      `  ${origin}/invite/${token}`,
      'Pass it on privately: whoever opens it first becomes the manager.',
    ].join('\n'),
  );
} catch (error) {
  console.error((error as Error).message);
  process.exitCode = 1;
} finally {
  await dataSource.destroy();
}
