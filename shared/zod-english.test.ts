import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { config, z } from 'zod/mini';
import { de } from 'zod/locales';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');

/** The schema modules the deck loads; they must not pull classic zod into the deck bundle. */
const DECK_PATH_SCHEMAS = [
  'shared/runs/run-event.schema.ts',
  'shared/programs/phase-band.schema.ts',
  'shared/programs/throttle.ts',
  'shared/programs/resolve-band.ts',
  'shared/sync/sync.schema.ts',
  'shared/problem/problem.schema.ts',
  'src/features/deck/reading-details.schema.ts',
];

/** Every module a file loads at run time (type-only imports are erased), followed through relative paths. */
function runtimeImports(file: string, seen = new Set<string>()): Set<string> {
  if (seen.has(file)) return seen;
  seen.add(file);
  const source = readFileSync(file, 'utf8');
  for (const match of source.matchAll(
    /^\s*(?:import|export)\s+(?!type\b)(?:[^'";]*?\sfrom\s+)?['"]([^'"]+)['"]/gm,
  )) {
    const specifier = match[1];
    if (specifier.startsWith('.'))
      runtimeImports(resolve(dirname(file), specifier.replace(/\.js$/, '') + '.ts'), seen);
    else seen.add(specifier);
  }
  return seen;
}

describe('deck-path schemas on zod/mini', () => {
  const saved = config().localeError;
  afterEach(() => {
    config({ localeError: saved });
  });

  it('load no classic zod, directly or through what they import', () => {
    for (const file of DECK_PATH_SCHEMAS) {
      const loaded = [...runtimeImports(resolve(root, file))];
      expect(loaded, file).toContain('zod/mini');
      expect(
        loaded.filter(
          (m) => m === 'zod' || m.startsWith('zod/v4') || m === 'zod/v3' || m === 'zod/v4-mini',
        ),
        file,
      ).toEqual([]);
    }
  });

  it('give a check without its own message the same English words as classic zod, when nothing else set them', async () => {
    config({ localeError: undefined });
    expect(z.string().safeParse(1).error?.issues[0].message).toBe('Invalid input');
    vi.resetModules();
    await import('./zod-english');
    expect(z.string().safeParse(1).error?.issues[0].message).toBe(
      'Invalid input: expected string, received number',
    );
  });

  it('leave a locale the app chose alone', async () => {
    config(de());
    const chosen = config().localeError;
    vi.resetModules();
    await import('./zod-english');
    expect(config().localeError).toBe(chosen);
  });
});
