/**
 * Debian's Chromium driven by playwright-core, with the flags this machine needs (no background networking, no
 * GPU) and a fresh profile folder for each browser.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { type BrowserContext, chromium } from "playwright-core";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const SCREENSHOT_DIR = path.resolve(import.meta.dirname, "..", "output", "screenshots");

const FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface Browser {
  context: BrowserContext;
  close(): Promise<void>;
}

export async function openBrowser(viewport = { width: 1440, height: 900 }): Promise<Browser> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), "backplate-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    args: FLAGS,
    viewport,
    headless: true,
  });
  return {
    context,
    async close() {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

export function screenshotPath(name: string): string {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return path.join(SCREENSHOT_DIR, `${name}.png`);
}
