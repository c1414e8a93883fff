import "server-only";
import { claimDueMail, markMailFailed, markMailSent } from "@/db/notifications";
import { appUrl, sendMail } from "./mail";
import { notificationMail } from "./mail-templates/notification";

/**
 * Sends the e-mail copies of notifications, after the transaction that made them has committed, and retries those
 * the mail server refused with backoff (db/notifications.ts: retryDelayMs). Saving never waits for mail: a change
 * commits its inbox rows; this loop, running in the server process, delivers them when the server takes them.
 */

/** How often the loop looks for due mail (a fresh notification is also kicked at once). */
const POLL_INTERVAL_MS = 3_000;

export interface FlushResult {
  sent: number;
  failed: number;
}

/** Sends every copy due at `now`; tests call it directly (with a later `now` to make a retry due). */
export async function flushNotificationMail(now = new Date()): Promise<FlushResult> {
  const result: FlushResult = { sent: 0, failed: 0 };
  for (;;) {
    const batch = await claimDueMail(now);
    if (batch.length === 0) return result;
    for (const mail of batch) {
      const attempts = mail.attempts + 1;
      try {
        await sendMail({ to: mail.to, ...notificationMail({ title: mail.title, body: mail.body, url: appUrl(mail.link) }) });
        await markMailSent(mail.id, attempts);
        result.sent += 1;
      } catch (error) {
        await markMailFailed(mail.id, attempts, (error as Error)?.message ?? String(error), now);
        result.failed += 1;
      }
    }
  }
}

const loop = globalThis as unknown as { backplateMailer?: { timer: NodeJS.Timeout; running: boolean } };

async function tick(): Promise<void> {
  const state = loop.backplateMailer;
  if (!state || state.running) return;
  state.running = true;
  try {
    await flushNotificationMail();
  } catch (error) {
    // the database being down is retried on the next tick like the mail server being down
    console.error("notification mailer:", (error as Error)?.message ?? error);
  } finally {
    state.running = false;
  }
}

/** Starts the retry loop once per process (instrumentation.ts at boot; kicks start it too). */
export function startNotificationMailer(): void {
  if (loop.backplateMailer) return;
  const timer = setInterval(() => void tick(), POLL_INTERVAL_MS);
  timer.unref();
  loop.backplateMailer = { timer, running: false };
}

/** After a commit that made notifications: send now rather than at the next tick. */
export function kickNotificationMailer(): void {
  startNotificationMailer();
  void tick();
}
