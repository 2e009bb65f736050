import fs from 'node:fs';
import type { TestProject } from 'vitest/node';
import { CHROMIUM_PATH, chromiumMissingMessage } from '../../scripts/chromium.js';
import { ensureClientBuilt } from '../../scripts/client-build.js';
import { startRealServer } from '../helpers/real-server.js';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
    dataDir: string;
  }
}

/** One real server (built client + API + the demo workshop) shared by the browser tests. */
export default async function setup(project: TestProject) {
  if (!fs.existsSync(CHROMIUM_PATH)) throw new Error(chromiumMissingMessage());
  ensureClientBuilt();
  const server = await startRealServer();
  project.provide('baseURL', server.baseURL);
  project.provide('dataDir', server.dir);
  return () => server.stop();
}
