import { execSync } from 'node:child_process';
import fs from 'node:fs';

/** Debian's chromium; browser downloads from elsewhere are impossible on our machines. */
export const CHROMIUM_PATH = process.env.RINGSEAT_CHROMIUM ?? '/usr/bin/chromium';

export const chromiumMissingMessage = () =>
  `Chromium was not found at ${CHROMIUM_PATH}. The browser tests drive Debian's chromium package: ` +
  `install it with "sudo apt-get update && sudo apt-get install -y chromium", ` +
  `or point RINGSEAT_CHROMIUM at a Chromium binary.`;

/** Installs chromium with apt-get when it is missing and we are root; otherwise explains how. */
export function ensureChromium(log: (line: string) => void = console.log): void {
  if (fs.existsSync(CHROMIUM_PATH)) return;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot || process.env.RINGSEAT_CHROMIUM) throw new Error(chromiumMissingMessage());
  log("Chromium is missing: installing Debian's chromium package with apt-get (about a minute)…");
  execSync(
    'apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium > /dev/null',
    { stdio: 'inherit', shell: '/bin/bash' },
  );
  if (!fs.existsSync(CHROMIUM_PATH)) throw new Error(chromiumMissingMessage());
}
