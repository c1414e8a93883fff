/** The live figures as the bench's figures panel shows them, read back as numbers. */
import type { Page } from "playwright-core";

/** "−37.8" → -37.8 (the app prints a true minus sign). */
export const readNumber = (text: string) => Number(text.replace("−", "-").replace(/[^0-9.eE+-]/g, ""));

/** The low corner (−3 dB), in Hz. */
export async function lowCornerHz(page: Page): Promise<number> {
  const text = (await page.getByTestId("figure-low").textContent()) ?? "";
  return readNumber(text) * (/kHz/.test(text) ? 1e3 : /mHz/.test(text) ? 1e-3 : 1);
}

/** The sensitivity in dB re 1 V/Pa (the panel shows "12.85 mV/Pa · −37.8 dB re 1 V/Pa"). */
export async function sensitivityDb(page: Page): Promise<number> {
  const text = (await page.getByTestId("figure-sensitivity").textContent()) ?? "";
  const db = /([−-]?[\d.]+)\s*dB re 1 V\/Pa/.exec(text);
  return db ? readNumber(db[1]) : Number.NaN;
}
