import { describe, expect, it } from 'vitest';
import { importGraph } from '../helpers/import-graph.js';

/*
 * The deck opens cold at sea from at most 150 KB of JavaScript (DEVELOPERS.md, "The deck is its
 * own small app"). What would break that is written here, so a wrong import fails `npm test`
 * at once instead of waiting for `npm run bench`.
 */
const WORKSHOP_ONLY = [
  { name: 'the router', test: (s: string) => /^react-router(-dom)?(\/|$)/.test(s) },
  { name: 'TanStack Query', test: (s: string) => s.startsWith('@tanstack/') },
  { name: 'classic zod', test: (s: string) => s === 'zod' || /^zod\/v[34](\/classic)?$/.test(s) },
  { name: 'the chart library', test: (s: string) => s === 'recharts' || s.startsWith('d3-') },
];

/** The page script and the deck app; the page script's import() of the workshop app is not taken on /deck. */
const deckGraph = () =>
  importGraph(['src/main.tsx', 'src/deck/deck-main.tsx'], (file) => file !== 'src/main.tsx');

function offenders(graph: ReturnType<typeof importGraph>) {
  return [...graph.packages]
    .flatMap(([specifier, by]) =>
      WORKSHOP_ONLY.filter((rule) => rule.test(specifier)).map(
        (rule) => `${rule.name} (${specifier}) imported by ${by}`,
      ),
    )
    .sort();
}

describe('what the deck loads', () => {
  it('has no router, no TanStack Query, no classic zod and no chart library', () => {
    expect(offenders(deckGraph())).toEqual([]);
  });

  it('takes nothing from the workshop app', () => {
    expect(deckGraph().files.filter((f) => f.startsWith('src/app/'))).toEqual([]);
  });

  it('is read the way the bundler reads it: the workshop app does load those libraries', () => {
    // Without this, a walker that followed nothing would pass the checks above.
    const workshop = offenders(importGraph(['src/app/app-main.tsx']));
    expect(workshop.some((o) => o.startsWith('the router'))).toBe(true);
    expect(workshop.some((o) => o.startsWith('TanStack Query'))).toBe(true);
    expect(workshop.some((o) => o.startsWith('classic zod'))).toBe(true);
  });
});
