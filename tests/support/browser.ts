import { chromium, type Browser, type Page } from 'playwright-core';
import { CHROMIUM } from './chromium';

/** Headless Debian Chromium, with background networking off (the machine has no outside network). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function newPage(browser: Browser, viewport = { width: 1280, height: 860 }): Promise<Page> {
  const context = await browser.newContext({ viewport });
  return context.newPage();
}
