/**
 * Debian's Chromium for the browser tests, driven by playwright-core (`npx playwright install` cannot work on these
 * machines; `apt-get install -y chromium` provides it, and `.ci/run` installs it).
 * @example const browser = await launchChromium(); // then browser.newPage(), and browser.close() in a finally
 */
import type { Browser } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';

/** No sandbox (CI runs as root); without the background-networking flags Chromium keeps trying hosts this closed network refuses. */
export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run'];

/** A headless Chromium with the flags above. */
export async function launchChromium(): Promise<Browser> {
  const { chromium } = await import('playwright-core');
  return chromium.launch({ executablePath: CHROMIUM, headless: true, args: CHROMIUM_ARGS });
}
