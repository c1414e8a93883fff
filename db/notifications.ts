import "server-only";
import { and, asc, count, desc, eq, inArray, isNull, lte, or, sql } from "drizzle-orm";
import { NOTIFICATION_KINDS, type NotificationKind } from "@/components/schemas/review";
import { type Database, getDb } from "./client";
import { AppError } from "./errors";
import { notificationPreferences, notifications, users } from "./schema";

type Writer = Pick<Database, "insert" | "select">;

export interface NewNotification {
  kind: NotificationKind;
  title: string;
  body: string;
  /** app path, such as /w/larkfield/designs/…/reviews/… (mail turns it into a full address) */
  link: string;
}

export interface Preferences {
  emailEnabled: boolean;
  /** kind → whether its e-mail copy is sent (absent: yes) */
  email: Partial<Record<NotificationKind, boolean>>;
}

const DEFAULT_PREFERENCES: Preferences = { emailEnabled: true, email: {} };

function fromRow(row: { emailEnabled: boolean; perKind: unknown } | undefined): Preferences {
  if (!row) return { ...DEFAULT_PREFERENCES, email: {} };
  const perKind = (row.perKind ?? {}) as Record<string, { email?: boolean }>;
  const email: Preferences["email"] = {};
  for (const kind of NOTIFICATION_KINDS) {
    if (typeof perKind[kind]?.email === "boolean") email[kind] = perKind[kind].email;
  }
  return { emailEnabled: row.emailEnabled, email };
}

export function wantsEmail(preferences: Preferences, kind: NotificationKind): boolean {
  return preferences.emailEnabled && preferences.email[kind] !== false;
}

export async function getPreferences(userId: string): Promise<Preferences> {
  const rows = await getDb().select().from(notificationPreferences).where(eq(notificationPreferences.userId, userId));
  return fromRow(rows[0]);
}

export async function setPreferences(userId: string, preferences: Preferences): Promise<Preferences> {
  const perKind = Object.fromEntries(Object.entries(preferences.email).map(([kind, email]) => [kind, { email }]));
  await getDb()
    .insert(notificationPreferences)
    .values({ userId, emailEnabled: preferences.emailEnabled, perKind })
    .onConflictDoUpdate({ target: notificationPreferences.userId, set: { emailEnabled: preferences.emailEnabled, perKind } });
  return getPreferences(userId);
}

/**
 * Adds one inbox row per person inside the caller's transaction, so a notification exists exactly when the change
 * it tells of was committed. Its e-mail copy starts "pending" (sent by the mailer after the commit) or "skipped" when
 * the person turned that kind's mail off. The actor never notifies themself; each person gets one row.
 */
export async function notify(tx: Writer, recipients: readonly string[], actorId: string | null, notification: NewNotification): Promise<number> {
  const people = [...new Set(recipients)].filter((id) => id !== actorId);
  if (people.length === 0) return 0;
  const prefRows = await tx.select().from(notificationPreferences).where(inArray(notificationPreferences.userId, people));
  const byUser = new Map(prefRows.map((row) => [row.userId, fromRow(row)]));
  const now = new Date();
  await tx.insert(notifications).values(
    people.map((userId) => {
      const email = wantsEmail(byUser.get(userId) ?? DEFAULT_PREFERENCES, notification.kind);
      return { userId, ...notification, emailStatus: email ? ("pending" as const) : ("skipped" as const), nextAttemptAt: email ? now : null };
    }),
  );
  return people.length;
}

export interface InboxEntry {
  id: string;
  kind: string;
  title: string;
  body: string;
  link: string;
  readAt: Date | null;
  createdAt: Date;
  emailStatus: string;
}

export async function listInbox(userId: string, options: { limit?: number; unreadOnly?: boolean } = {}): Promise<InboxEntry[]> {
  const where = options.unreadOnly ? and(eq(notifications.userId, userId), isNull(notifications.readAt)) : eq(notifications.userId, userId);
  return getDb()
    .select({
      id: notifications.id,
      kind: notifications.kind,
      title: notifications.title,
      body: notifications.body,
      link: notifications.link,
      readAt: notifications.readAt,
      createdAt: notifications.createdAt,
      emailStatus: notifications.emailStatus,
    })
    .from(notifications)
    .where(where)
    .orderBy(desc(notifications.createdAt), desc(notifications.id))
    .limit(Math.min(options.limit ?? 100, 200));
}

export async function unreadCount(userId: string): Promise<number> {
  const [row] = await getDb()
    .select({ n: count() })
    .from(notifications)
    .where(and(eq(notifications.userId, userId), isNull(notifications.readAt)));
  return row?.n ?? 0;
}

/** Marks the person's own notifications read (others' ids are ignored, never an error that reveals them). */
export async function markRead(userId: string, which: { ids: string[] } | { all: true }): Promise<number> {
  const mine = and(eq(notifications.userId, userId), isNull(notifications.readAt));
  const where = "all" in which ? mine : and(mine, inArray(notifications.id, which.ids));
  const rows = await getDb().update(notifications).set({ readAt: new Date() }).where(where).returning({ id: notifications.id });
  return rows.length;
}

// ——— the e-mail copies (sent by app/_server/notification-mailer.ts) ———

/** Attempts before a mail counts as failed for good (the inbox row stays). */
export const MAX_EMAIL_ATTEMPTS = 6;
/** Backoff after the n-th failed attempt: 30 s, 1, 2, 4, 8 min … capped at an hour. */
export function retryDelayMs(attempts: number): number {
  return Math.min(30_000 * 2 ** Math.max(0, attempts - 1), 3_600_000);
}

export interface PendingMail {
  id: string;
  to: string;
  name: string | null;
  kind: string;
  title: string;
  body: string;
  link: string;
  attempts: number;
}

/**
 * Claims due mail: rows pending whose next attempt is due, locked with SKIP LOCKED so two server processes (or a
 * test's flush beside the loop) never send the same copy twice; the claim pushes next_attempt_at ahead while the
 * copy is in flight.
 */
export async function claimDueMail(now: Date, limit = 20): Promise<PendingMail[]> {
  return getDb().transaction(async (tx) => {
    const due = await tx
      .select({ id: notifications.id })
      .from(notifications)
      .where(and(eq(notifications.emailStatus, "pending"), or(isNull(notifications.nextAttemptAt), lte(notifications.nextAttemptAt, now))))
      .orderBy(asc(notifications.createdAt))
      .limit(limit)
      .for("update", { skipLocked: true });
    if (due.length === 0) return [];
    const ids = due.map((row) => row.id);
    await tx
      .update(notifications)
      .set({ nextAttemptAt: sql`${now.toISOString()}::timestamptz + interval '2 minutes'` })
      .where(inArray(notifications.id, ids));
    return tx
      .select({
        id: notifications.id,
        to: users.email,
        name: users.name,
        kind: notifications.kind,
        title: notifications.title,
        body: notifications.body,
        link: notifications.link,
        attempts: notifications.emailAttempts,
      })
      .from(notifications)
      .innerJoin(users, eq(users.id, notifications.userId))
      .where(inArray(notifications.id, ids));
  });
}

export async function markMailSent(id: string, attempts: number): Promise<void> {
  await getDb()
    .update(notifications)
    .set({ emailStatus: "sent", emailAttempts: attempts, emailLastError: null, nextAttemptAt: null })
    .where(eq(notifications.id, id));
}

export async function markMailFailed(id: string, attempts: number, error: string, now: Date): Promise<void> {
  const final = attempts >= MAX_EMAIL_ATTEMPTS;
  await getDb()
    .update(notifications)
    .set({
      emailStatus: final ? "failed" : "pending",
      emailAttempts: attempts,
      emailLastError: error.slice(0, 500),
      nextAttemptAt: final ? null : new Date(now.getTime() + retryDelayMs(attempts)),
    })
    .where(eq(notifications.id, id));
}

/** For tests and the inbox: one notification's mail state. */
export async function getNotificationMailState(id: string) {
  const [row] = await getDb()
    .select({ status: notifications.emailStatus, attempts: notifications.emailAttempts, nextAttemptAt: notifications.nextAttemptAt, error: notifications.emailLastError })
    .from(notifications)
    .where(eq(notifications.id, id));
  if (!row) throw new AppError("not_found", "No such notification.");
  return row;
}
