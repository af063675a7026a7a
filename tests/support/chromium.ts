import { existsSync } from 'node:fs';
import { ensureDebianPackage } from '../../server/local-services/run-command';

export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/** Debian's Chromium drives the browser journeys; installed when missing and running as root. */
export function ensureChromium(): void {
  ensureDebianPackage('chromium', () => existsSync(CHROMIUM), 'The browser tests');
}
