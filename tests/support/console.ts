import type { Page } from 'playwright-core';

/**
 * Collects what a page writes to its console as errors or warnings (failed requests show up here too, as
 * Chromium logs them; each is also listed with its address) and uncaught exceptions. Read `messages` after the screen has loaded.
 */
export function watchConsole(page: Page) {
  const messages: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warning') messages.push(`${m.type()}: ${m.text()}`);
  });
  page.on('pageerror', (err) => messages.push(`uncaught: ${err.message}`));
  // Chromium's own line names no address; this one says which request failed.
  page.on('response', (res) => {
    if (res.status() >= 400) messages.push(`${res.status()} ${res.request().method()} ${new URL(res.url()).pathname}`);
  });
  return messages;
}
