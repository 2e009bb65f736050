import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { apiSession, openRunFor } from '../helpers/api.js';
import { keepScreenshot, launchBrowser, newContext, PHONE, signIn } from '../helpers/browser.js';

/*
 * The deck at sea: the app opens from its service worker with the network off, and a twin
 * outing on Blue Tern (demo data) is logged offline. The fake clock of the browser context moves
 * time on without waiting; the real clock keeps running underneath.
 */
const baseURL = inject('baseURL');
let browser: Browser;
let ternId: string;

/** Another browser test may be assigning the same engines at the same moment: ask again once. */
async function openRun(tech: Awaited<ReturnType<typeof apiSession>>, position: string) {
  try {
    return await openRunFor(tech, 'Blue Tern', position);
  } catch {
    return openRunFor(tech, 'Blue Tern', position);
  }
}

beforeAll(async () => {
  const tech = await apiSession(baseURL, 'ivo@tidewright.example');
  await openRun(tech, 'port');
  await openRun(tech, 'starboard');
  ternId = (await tech('/api/vessels')).body.vessels.find(
    (v: { name: string }) => v.name === 'Blue Tern',
  ).id;
  browser = await launchBrowser();
}, 120_000);
afterAll(() => browser?.close());

async function signedInOnDeck(context: BrowserContext, email: string, path: string): Promise<Page> {
  const page = await context.newPage();
  await signIn(page, email);
  await expect.poll(() => new URL(page.url()).pathname, { timeout: 15_000 }).not.toBe('/sign-in');
  await page.goto(path);
  // The service worker has installed and precached the app once it controls the page.
  await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
    timeout: 30_000,
  });
  return page;
}

/** Counts records in the device database, straight from IndexedDB. */
const countEvents = (page: Page, kind: string) =>
  page.evaluate(async (wanted) => {
    const open = indexedDB.open('ringseat');
    const idb: IDBDatabase = await new Promise((resolve, reject) => {
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    const all: Array<{ kind: string }> = await new Promise((resolve, reject) => {
      const request = idb.transaction('events').objectStore('events').getAll();
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error);
    });
    idb.close();
    return all.filter((e) => e.kind === wanted).length;
  }, kind);

const visible = (page: Page, text: string | RegExp) => page.getByText(text).first().isVisible();

describe('on deck with no signal', () => {
  it('opens from the service worker with the network off and still shows the runs', async () => {
    const context = await newContext(browser, baseURL, PHONE);
    try {
      const page = await signedInOnDeck(context, 'sunniva@skipper.example', '/deck');
      await expect
        .poll(() => visible(page, 'Four-stroke outboard, about 10 hours'), { timeout: 30_000 })
        .toBe(true);
      await context.setOffline(true);
      await page.reload();
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'On deck' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      // The heading comes before the device database has answered: wait for the list itself.
      await expect
        .poll(
          () =>
            page
              .getByRole('list', { name: 'Vessels on this device' })
              .getByText('Blue Tern')
              .isVisible(),
          { timeout: 15_000 },
        )
        .toBe(true);
      expect(await visible(page, 'Four-stroke outboard, about 10 hours')).toBe(true);
      // A cold start on a deep link, offline: the app shell comes from the cache, the data from IndexedDB.
      const cold = await context.newPage();
      await cold.goto(`/deck/${ternId}`);
      await expect
        .poll(() => cold.getByRole('region', { name: 'Starboard' }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      expect(await cold.getByRole('heading', { level: 1, name: /Blue Tern/ }).isVisible()).toBe(
        true,
      );
      // The API is never answered with the app: offline it fails as a network error.
      expect(
        await cold.evaluate(() =>
          fetch('/api/auth/me').then(
            (r) => r.headers.get('content-type'),
            () => 'network error',
          ),
        ),
      ).toBe('network error');
    } finally {
      await context.close();
    }
  });

  it('logs a twin outing offline, alerts over the band, and survives a reload mid-outing', async () => {
    const context = await newContext(browser, baseURL, PHONE);
    await context.clock.install();
    try {
      const page = await signedInOnDeck(context, 'ivo@tidewright.example', `/deck/${ternId}`);
      await expect
        .poll(
          () =>
            page
              .getByRole('button', { name: 'Start outing' })
              .isEnabled()
              .catch(() => false),
          { timeout: 30_000 },
        )
        .toBe(true);
      await context.setOffline(true);
      await page.reload();
      await page.getByText('I have read the cautions').click();
      await page.getByRole('button', { name: 'Start outing' }).click();
      const port = page.getByRole('region', { name: 'Port' });
      const band = (await port.getByText(/^\d+–\d+ rpm$/).textContent())!;
      const rpmMax = Number(band.split('–')[1].replace(' rpm', ''));
      const readingsBefore = await countEvents(page, 'reading');

      const log = async (rpm: number) => {
        await page.getByRole('textbox', { name: 'Engine speed (RPM)' }).fill(String(rpm));
        await page.getByRole('radio', { name: 'idle' }).click();
        await page.getByRole('button', { name: 'Log reading' }).click();
        await expect
          .poll(() => visible(page, `Logged ${rpm} and ${rpm} rpm at idle for Port and Starboard.`))
          .toBe(true);
      };
      const timeInBand = () => port.getByTestId('time-in-band').textContent();

      await log(Math.min(800, rpmMax - 100)); // in band: idle speed, below the band's top (demo figure)
      await expect
        .poll(() => port.getByRole('status', { name: /Port: In band/ }).isVisible())
        .toBe(true);
      await page.clock.fastForward(120_000);
      await log(rpmMax + 500); // over the band's top on both engines
      await expect
        .poll(() => port.getByRole('status', { name: /Port: Over/ }).isVisible())
        .toBe(true);
      const held = await timeInBand();
      expect(held).toMatch(/^0:0[23]:\d\d$/);

      await page.clock.fastForward(65_000); // past the one-minute grace (our own allowance)
      await expect
        .poll(() => visible(page, 'Over the band: ease back'), { timeout: 10_000 })
        .toBe(true);
      await expect
        .poll(() => countEvents(page, 'alert'), { timeout: 10_000 })
        .toBeGreaterThanOrEqual(2);
      expect(await timeInBand()).toBe(held); // time over the band never counts as time in band
      expect(await countEvents(page, 'reading')).toBe(readingsBefore + 4);
      await keepScreenshot(page, 'deck-run-day-phone');

      await page.reload(); // still offline, mid-outing
      await expect
        .poll(() => port.getByRole('status', { name: /Port: Over/ }).isVisible(), {
          timeout: 15_000,
        })
        .toBe(true);
      expect(await timeInBand()).toBe(held);
      expect(await countEvents(page, 'reading')).toBe(readingsBefore + 4);
      expect(await visible(page, 'Outing under way')).toBe(true);

      await log(Math.min(800, rpmMax - 100));
      await page.clock.fastForward(30_000);
      await expect.poll(async () => (await timeInBand())! > held!).toBe(true);
      expect(await countEvents(page, 'reading')).toBe(readingsBefore + 6);

      // A 12-megapixel camera photo is made smaller on the phone and kept with the next reading.
      const photo = await page.evaluate(async () => {
        const canvas = Object.assign(document.createElement('canvas'), {
          width: 4000,
          height: 3000,
        });
        const g = canvas.getContext('2d')!;
        for (let i = 0; i < 400; i++) g.fillRect((i * 97) % 4000, (i * 53) % 3000, 90, 60);
        const blob: Blob = await new Promise((resolve) =>
          canvas.toBlob((b) => resolve(b!), 'image/png'),
        );
        return Array.from(new Uint8Array(await blob.arrayBuffer()));
      });
      await page.getByRole('button', { name: 'Details' }).click();
      await page.getByLabel('Photo (hour meter, tachometer…)').setInputFiles({
        name: 'hour-meter.png',
        mimeType: 'image/png',
        buffer: Buffer.from(photo),
      });
      await expect
        .poll(() => visible(page, /Photo ready: 1600×1200/), { timeout: 10_000 })
        .toBe(true);
      await page.getByRole('button', { name: 'Keep details' }).click();
      await page.getByRole('button', { name: 'Log reading' }).click();
      await expect.poll(() => countEvents(page, 'reading')).toBe(readingsBefore + 8);
      const stored = await page.evaluate(async () => {
        const open = indexedDB.open('ringseat');
        const idb: IDBDatabase = await new Promise((resolve) => {
          open.onsuccess = () => resolve(open.result);
        });
        const photos: Array<{ width: number; height: number; blob: Blob; sync: string }> =
          await new Promise((resolve) => {
            const request = idb.transaction('photos').objectStore('photos').getAll();
            request.onsuccess = () => resolve(request.result);
          });
        idb.close();
        return photos.map((p) => ({
          width: p.width,
          height: p.height,
          bytes: p.blob.size,
          sync: p.sync,
        }));
      });
      expect(stored).toEqual([
        expect.objectContaining({ width: 1600, height: 1200, sync: 'pending' }),
      ]);
      expect(stored[0].bytes).toBeLessThan(1_500_000);

      await page.getByRole('button', { name: 'Display mode' }).click();
      await page.getByRole('button', { name: 'Night' }).click();
      await keepScreenshot(page, 'deck-run-night-phone');
    } finally {
      await context.close();
    }
  });

  it('goes from the workshop to the deck and back through the main navigation, online and offline', async () => {
    const context = await newContext(browser, baseURL);
    const page = await context.newPage();
    await signIn(page, 'ivo@tidewright.example');
    await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
      timeout: 30_000,
    });
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Deck' }).click();
    await expect
      .poll(() => page.getByRole('heading', { name: 'On deck' }).isVisible(), { timeout: 15_000 })
      .toBe(true);
    await expect
      .poll(() => page.getByRole('link', { name: 'Go on deck with Blue Tern' }).isVisible())
      .toBe(true);
    await page.getByRole('link', { name: 'Go on deck with Blue Tern' }).click();
    await expect.poll(() => new URL(page.url()).pathname).toBe(`/deck/${ternId}`);
    await context.setOffline(true);
    await nav.getByRole('link', { name: 'Runs' }).click();
    await expect.poll(() => new URL(page.url()).pathname, { timeout: 15_000 }).toBe('/runs');
    await expect
      .poll(() => nav.getByRole('link', { name: 'Runs' }).getAttribute('aria-current'), {
        timeout: 15_000,
      })
      .toBe('page');
    await nav.getByRole('link', { name: 'Deck' }).click();
    await expect
      .poll(() => page.getByRole('heading', { name: 'On deck' }).isVisible(), { timeout: 15_000 })
      .toBe(true);
    await context.close();
  }, 90_000);
});
