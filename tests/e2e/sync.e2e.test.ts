import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { apiSession, openRunFor } from '../helpers/api.js';
import { launchBrowser, newContext, PHONE, signIn } from '../helpers/browser.js';

const baseURL = inject('baseURL');
let browser: Browser;
let context: BrowserContext;
let page: Page;
let runs: Array<{
  id: string;
  engine: { id: string };
  program: { phases: Array<{ id: string; performedBy: string }> };
}>;

beforeAll(async () => {
  const tech = await apiSession(baseURL, 'ivo@tidewright.example');
  runs = [
    await openRunFor(tech, 'Blue Tern', 'port'),
    await openRunFor(tech, 'Blue Tern', 'starboard'),
  ];
  browser = await launchBrowser();
  context = await newContext(browser, baseURL, PHONE);
  page = await context.newPage();
  await signIn(page, 'sunniva@skipper.example');
  await waitForPill(/All synced/);
}, 120_000);
afterAll(async () => {
  await context?.close();
  await browser?.close();
});

/** Waits until the sync pill says `text` (usable in hooks, where expect.poll is not). */
async function waitForPill(text: RegExp) {
  const pill = page.getByRole('button', { name: /^Sync:/ }).first();
  const deadline = Date.now() + 30_000;
  let label = '';
  while (Date.now() < deadline) {
    label = (await pill.getAttribute('aria-label').catch(() => null)) ?? '';
    if (text.test(label)) return;
    await page.waitForTimeout(250);
  }
  throw new Error(`sync pill still says "${label}", expected ${text}`);
}

/**
 * Logs readings into the device database exactly as the on-deck screen stores them (pending,
 * device-made ids), while the browser is offline. 25 per engine, alternating like a twin outing.
 */
async function logOffline(count: number, startAt: number): Promise<string[]> {
  const items = Array.from({ length: count }, (_, i) => {
    const run = runs[i % 2];
    const phase = run.program.phases.find((p) => p.performedBy === 'skipper')!;
    return {
      runId: run.id,
      engineId: run.engine.id,
      phaseId: phase.id,
      at: startAt + i * 5000,
      rpm: 2400 + (i % 7) * 100,
    };
  });
  return page.evaluate(async (readings) => {
    const open = indexedDB.open('ringseat');
    const idb: IDBDatabase = await new Promise((resolve, reject) => {
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    const tx = idb.transaction('events', 'readwrite');
    const ids = readings.map((r) => {
      const id = crypto.randomUUID();
      const event = {
        kind: 'reading',
        id,
        at: r.at,
        engineId: r.engineId,
        phaseId: r.phaseId,
        rpm: r.rpm,
        throttle: 'half',
      };
      tx.objectStore('events').put({
        id,
        runId: r.runId,
        engineId: r.engineId,
        at: r.at,
        kind: 'reading',
        event,
        origin: 'device',
        sync: 'pending',
        createdAt: Date.now(),
      });
      return id;
    });
    await new Promise((resolve, reject) => {
      tx.oncomplete = resolve;
      tx.onerror = () => reject(tx.error);
    });
    idb.close();
    return ids;
  }, items);
}

/** What the workshop sees: every reading stored for the two runs, by id. */
async function serverReadingIds(): Promise<string[]> {
  const skipper = await apiSession(baseURL, 'sunniva@skipper.example');
  const ids: string[] = [];
  let cursor = 0;
  for (;;) {
    const body = (await skipper(`/api/sync/pull?cursor=${cursor}`)).body;
    for (const e of body.events)
      if (runs.some((r) => r.id === e.runId) && e.event.kind === 'reading') ids.push(e.event.id);
    cursor = body.cursor;
    if (!body.more) return ids;
  }
}

describe('sync between the boat and the workshop', () => {
  it('sends 50 readings logged offline on two engines exactly once when the signal returns', async () => {
    const before = await serverReadingIds();
    await context.setOffline(true);
    const logged = await logOffline(50, Date.parse('2026-12-01T10:00:00Z'));
    await page
      .getByRole('button', { name: /^Sync:/ })
      .first()
      .click(); // open details, still offline
    await expect
      .poll(() => page.getByRole('heading', { name: /Waiting to send \(50\)/ }).isVisible(), {
        timeout: 10_000,
      })
      .toBe(true);
    await page.getByRole('button', { name: 'Close' }).click();
    await context.setOffline(false);
    await waitForPill(/All synced/);
    const after = await serverReadingIds();
    expect(after.length - before.length).toBe(50);
    expect(after).toEqual(expect.arrayContaining(logged));
    expect(new Set(after).size).toBe(after.length);
  });

  it('stores nothing twice when the connection drops after the server committed a push', async () => {
    const before = await serverReadingIds();
    await context.setOffline(true);
    const logged = await logOffline(50, Date.parse('2026-12-01T11:00:00Z'));
    let cut = 0;
    await page.route('**/api/sync/push', async (route) => {
      if (cut > 0) return route.continue();
      cut++;
      await route.fetch(); // the server receives and commits the batch…
      await route.abort('connectionreset'); // …and the answer never reaches the phone
    });
    await context.setOffline(false);
    await page
      .getByRole('button', { name: /^Sync:/ })
      .first()
      .click();
    await page.getByRole('button', { name: 'Sync now' }).click();
    await expect.poll(() => cut, { timeout: 15_000 }).toBe(1);
    await page.getByRole('button', { name: 'Sync now' }).click();
    await expect
      .poll(() => page.getByRole('heading', { name: 'Waiting to send (0)' }).isVisible(), {
        timeout: 30_000,
      })
      .toBe(true);
    await page.unroute('**/api/sync/push');
    const after = await serverReadingIds();
    expect(after.length - before.length).toBe(50);
    expect(after).toEqual(expect.arrayContaining(logged));
    expect(new Set(after).size).toBe(after.length);
  });
});
