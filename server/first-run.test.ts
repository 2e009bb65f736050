import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { runDatabaseCommand, startRealServer } from '../tests/helpers/real-server.js';
import { DEMO } from '../tests/helpers/test-server.js';

/* A production start never makes a database by itself; the operator makes the first workshop. */

const dirs: string[] = [];
const freshDir = () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-first-'));
  dirs.push(dir);
  return dir;
};
afterEach(() => {
  for (const dir of dirs.splice(0)) fs.rmSync(dir, { recursive: true, force: true });
});

const PRODUCTION = { NODE_ENV: 'production', LOG_LEVEL: 'warn' };
const startServer = (dir: string) => runDatabaseCommand('server/index.ts', [], dir, PRODUCTION);
const createWorkshop = (dir: string, args: string[]) =>
  runDatabaseCommand('server/cli/create-workshop.ts', args, dir, PRODUCTION);

describe('starting in production', () => {
  it('refuses a missing database file and creates none', () => {
    const dir = freshDir();
    const start = startServer(dir);
    expect(start.status).toBe(1);
    expect(start.stderr).toContain('there is no file there');
    expect(start.stderr).toContain('npm run db:create-workshop');
    expect(fs.existsSync(path.join(dir, 'ringseat.sqlite'))).toBe(false);
  });

  it('refuses an empty database file and leaves it as it is', () => {
    const dir = freshDir();
    fs.writeFileSync(path.join(dir, 'ringseat.sqlite'), '');
    const start = startServer(dir);
    expect(start.status).toBe(1);
    expect(start.stderr).toContain('the file there is empty');
    expect(fs.statSync(path.join(dir, 'ringseat.sqlite')).size).toBe(0);
  });

  it('refuses a database that holds no workshop', () => {
    const dir = freshDir();
    expect(runDatabaseCommand('server/cli/migrate.ts', [], dir, PRODUCTION).status).toBe(0);
    const start = startServer(dir);
    expect(start.status).toBe(1);
    expect(start.stderr).toContain('holds no workshop, so nobody can sign in');
  });
});

describe('creating the first workshop', () => {
  it('names each bad option, and a second run gives a new link for the same workshop', () => {
    const dir = freshDir();
    const bad = createWorkshop(dir, [
      '--workshop',
      ' ',
      '--email',
      'harbour',
      '--timezone',
      'Mars/Base',
    ]);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain('--workshop: Give the workshop its name');
    expect(bad.stderr).toContain('--email: Enter a valid e-mail address');
    expect(bad.stderr).toContain('--timezone: The time zone (--timezone) must be a zone name');
    expect(fs.existsSync(path.join(dir, 'ringseat.sqlite'))).toBe(false);

    const args = ['--workshop', 'Skerry Marine Works', '--email', 'hedda@skerry.example'];
    const first = createWorkshop(dir, args);
    expect(first.stdout).toContain('workshop "Skerry Marine Works" created');
    const again = createWorkshop(dir, args);
    expect(again.stdout).toContain('has no manager yet; here is a new link');
    const links = [first, again].map((r) => r.stdout.match(/\/invite\/([\w-]{43})/)?.[1]);
    expect(links.every(Boolean) && links[0] !== links[1]).toBe(true);
  });

  it('serves the new workshop in production, with no demo accounts in it', async () => {
    const dir = freshDir();
    createWorkshop(dir, ['--workshop', 'Skerry Marine Works', '--email', 'hedda@skerry.example']);
    const server = await startRealServer(PRODUCTION, [], dir);
    try {
      const signIn = await fetch(`${server.baseURL}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Origin: server.baseURL },
        body: JSON.stringify({ email: DEMO.manager, password: 'ringseat-demo' }),
      });
      expect(signIn.status).toBe(401);
    } finally {
      await server.stop();
    }
  });
});
