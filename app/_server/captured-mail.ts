/**
 * Reads what the mail fake kept (scripts/lib/mail-fake.ts): the JSON beside each .eml in BACKPLATE_MAIL_FAKE_DIR,
 * newest first. For /dev/mail, /api/dev/mail and the tests; null when the fake is not in use.
 */
import fs from "node:fs";
import path from "node:path";

export interface CapturedMail {
  id: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  date: string;
}

export function mailFakeDir(): string | null {
  return process.env.BACKPLATE_MAIL_FAKE_DIR || null;
}

export function readCapturedMail(dir: string | null = mailFakeDir(), limit = 100): CapturedMail[] | null {
  if (!dir) return null;
  // The folder is only known at run time; the ignore comments keep Next's file tracing from packing the whole project.
  if (!fs.existsSync(/*turbopackIgnore: true*/ dir)) return [];
  return fs
    .readdirSync(/*turbopackIgnore: true*/ dir)
    .filter((name) => name.endsWith(".json"))
    .sort()
    .reverse()
    .slice(0, limit)
    .flatMap((name) => {
      try {
        return [JSON.parse(fs.readFileSync(/*turbopackIgnore: true*/ path.join(dir, name), "utf8")) as CapturedMail];
      } catch {
        return []; // a message still being written
      }
    });
}
