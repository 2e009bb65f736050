/*
 * The on-deck route: (1) the JavaScript it loads is at most 150 KB gzip, with no chart library
 * and no workshop code; (2) with the service worker in place, an offline reload reaches the run
 * screen in under 1 second in headless chromium. Run with `npx tsx bench/deck.bench.ts`; it
 * builds the client when stale, starts a real server on a fresh demo database, prints the
 * figures and exits 1 on a miss. Targets are the issue's; the data is the demo data.
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import type { BrowserContext, Page } from 'playwright-core';
import { CLIENT_DIR, ensureClientBuilt } from '../scripts/client-build';
import { apiSession, openRunFor } from '../tests/helpers/api';
import { launchBrowser, newContext, PHONE } from '../tests/helpers/browser';
import { startRealServer } from '../tests/helpers/real-server';

const JS_TARGET_KB = 150;
const RELOAD_TARGET_MS = 1000;
const RELOADS = 7;
const FORBIDDEN = [
  /recharts/,
  /d3-/,
  /victory/,
  /features\/(review|workshop|sign-off|programs|checklists)\//,
];
/** What only the workshop app needs (DEVELOPERS.md, "The deck is its own small app"), by source path. */
const WORKSHOP_ONLY = [
  /node_modules\/react-router/,
  /node_modules\/@tanstack\//,
  /node_modules\/zod\/v4\/classic\//,
  /src\/app\/(router|routes)/,
];

function sourceMap(file: string): { sources: string[]; sourcesContent?: string[] } {
  const map = `${file}.map`;
  return fs.existsSync(map) ? JSON.parse(fs.readFileSync(map, 'utf8')) : { sources: [] };
}

/** Which packages and folders a built chunk is made of, from its source map (for the printout). */
function chunkMakeup(file: string): string[] {
  const { sources, sourcesContent = [] } = sourceMap(file);
  const sizes = new Map<string, number>();
  sources.forEach((source, i) => {
    const key = source.includes('node_modules/')
      ? source
          .split('node_modules/')
          .pop()!
          .split('/')
          .slice(0, source.split('node_modules/').pop()!.startsWith('@') ? 2 : 1)
          .join('/')
      : source
          .replace(/^(\.\.\/)+/, '')
          .split('/')
          .slice(0, 3)
          .join('/');
    sizes.set(key, (sizes.get(key) ?? 0) + (sourcesContent[i]?.length ?? 0));
  });
  return [...sizes].sort((a, b) => b[1] - a[1]).map(([key]) => key);
}

async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('ringseat-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-in');
}

const runScreen = (page: Page) =>
  page
    .getByRole('region', { name: 'Port' })
    .getByTestId('time-in-band')
    .waitFor({ timeout: 10_000 });

/** The JS files a fresh load of the deck route asks for, gzipped as a server would send them. */
async function deckJavaScript(page: Page, deckPath: string) {
  const scripts = new Set<string>();
  const onRequest = (request: { resourceType(): string; url(): string }) => {
    if (request.resourceType() === 'script') scripts.add(new URL(request.url()).pathname);
  };
  page.on('request', onRequest);
  await page.goto(deckPath);
  await runScreen(page);
  await page.waitForLoadState('networkidle');
  page.off('request', onRequest);
  return [...scripts].map((urlPath) => {
    const file = path.join(CLIENT_DIR, urlPath);
    const gzipBytes = zlib.gzipSync(fs.readFileSync(file)).length;
    return { urlPath, gzipBytes, makeup: chunkMakeup(file), sources: sourceMap(file).sources };
  });
}

async function offlineReloads(page: Page): Promise<number[]> {
  const times: number[] = [];
  for (let i = 0; i < RELOADS; i++) {
    const began = performance.now();
    await page.reload();
    await runScreen(page);
    times.push(performance.now() - began);
  }
  return times;
}

/** The deck's JavaScript against its size budget, printed file by file; true when it fits. */
async function checkSize(page: Page, deckPath: string): Promise<boolean> {
  const files = await deckJavaScript(page, deckPath);
  const totalKb = files.reduce((sum, f) => sum + f.gzipBytes, 0) / 1024;
  console.log(`deck route JavaScript (gzip), ${files.length} files:`);
  for (const f of files.sort((a, b) => b.gzipBytes - a.gzipBytes)) {
    console.log(
      `  ${(f.gzipBytes / 1024).toFixed(1).padStart(6)} KB  ${f.urlPath}  ${f.makeup.slice(0, 6).join(', ')}`,
    );
  }
  const forbidden = files.flatMap((f) =>
    f.makeup
      .filter((part) => FORBIDDEN.some((re) => re.test(part)))
      .map((part) => `${f.urlPath}: ${part}`),
  );
  console.log(
    `total ${totalKb.toFixed(1)} KB, target ≤ ${JS_TARGET_KB} KB; chart or workshop code: ${forbidden.length ? forbidden.join('; ') : 'none'}`,
  );
  const workshopOnly = [
    ...new Set(
      files.flatMap((f) =>
        f.sources
          .filter((src) => WORKSHOP_ONLY.some((re) => re.test(src)))
          .map((src) =>
            src
              .replace(/^.*node_modules\//, '')
              .split('/')
              .slice(0, 3)
              .join('/'),
          ),
      ),
    ),
  ];
  console.log(
    `router, server-state cache or classic zod on the deck: ${workshopOnly.length ? workshopOnly.join(', ') : 'none'}`,
  );
  const sizeOk = totalKb <= JS_TARGET_KB && forbidden.length === 0 && workshopOnly.length === 0;
  console.log(sizeOk ? 'PASS size' : 'FAIL size');
  return sizeOk;
}

/** Starts an outing, goes offline and reloads the run screen; true when the median is in time. */
async function checkOfflineReload(page: Page, context: BrowserContext): Promise<boolean> {
  await page.getByText('I have read the cautions').click();
  await page.getByRole('button', { name: 'Start outing' }).click();
  await page.getByRole('button', { name: 'Log reading' }).waitFor();
  await context.setOffline(true);
  const times = (await offlineReloads(page)).sort((a, b) => a - b);
  const median = times[Math.floor(times.length / 2)];
  console.log(
    `offline reload to the run screen, ${RELOADS} runs: ${times.map((t) => t.toFixed(0)).join(', ')} ms`,
  );
  console.log(
    `median ${median.toFixed(0)} ms, slowest ${times[times.length - 1].toFixed(0)} ms, target median < ${RELOAD_TARGET_MS} ms`,
  );
  const reloadOk = median < RELOAD_TARGET_MS;
  console.log(reloadOk ? 'PASS offline reload' : 'FAIL offline reload');
  return reloadOk;
}

async function main() {
  ensureClientBuilt();
  const server = await startRealServer();
  const browser = await launchBrowser();
  let failed: boolean;
  try {
    const tech = await apiSession(server.baseURL, 'ivo@tidewright.example');
    await openRunFor(tech, 'Blue Tern', 'port');
    await openRunFor(tech, 'Blue Tern', 'starboard');
    const ternId = (await tech('/api/vessels')).body.vessels.find(
      (v: { name: string }) => v.name === 'Blue Tern',
    ).id as string;
    const context = await newContext(browser, server.baseURL, PHONE);
    const page = await context.newPage();
    await signIn(page, 'ivo@tidewright.example');
    await page.goto(`/deck/${ternId}`);
    await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, {
      timeout: 30_000,
    });
    await page.getByRole('button', { name: 'Start outing' }).waitFor({ timeout: 30_000 });
    const sizeOk = await checkSize(page, `/deck/${ternId}`);
    const reloadOk = await checkOfflineReload(page, context);
    failed = !sizeOk || !reloadOk;
    await context.close();
  } finally {
    await browser.close();
    await server.stop();
  }
  console.log(failed ? 'FAIL' : 'PASS');
  if (failed) process.exitCode = 1;
}

await main();
