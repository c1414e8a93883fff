/**
 * The review workflow against the real database and the SMTP fake: targets checked on save, a review requested by
 * mail, remarks by two reviewers, an outdated remark after a new revision, decisions with the role rules, the lock on
 * an approved revision, and mail retried after the mail server was down.
 */
import { describe, expect, it } from "vitest";
import { flushNotificationMail } from "@/app/_server/notification-mailer";
import { listDesigns } from "@/db/designs";
import { getNotificationMailState, listInbox, setPreferences, unreadCount } from "@/db/notifications";
import { addRemark, listThreads, setRemarkResolved } from "@/db/remarks";
import { decide } from "@/db/review-decisions";
import { getReviewDetail } from "@/db/review-detail";
import { createReview, listReviews } from "@/db/reviews";
import { getRevisionChecks, storeRevisionChecks } from "@/db/revision-checks";
import { linkIn, waitForMail } from "./captured-mail-helpers";
import { demoWith, reviewScene } from "./review-fixtures";

/** The demo's low corner is about 8 Hz with COUT = 22 µF into the 1.2 kΩ desk; 4.7 µF puts it near 30 Hz. */
const LOW_CORNER_TARGET = [{ figure: "low_corner_hz", max: 20 }, { figure: "self_noise_dba_spl", max: 14 }];

describe("design targets on save", () => {
  it("stores failing checks for a revision that misses a target, and passing ones once it is fixed", async () => {
    const scene = await reviewScene();
    const failing = await scene.save(demoWith({ part: "COUT", value: "4.7u" }, LOW_CORNER_TARGET), "Smaller output capacitor");
    const bad = await getRevisionChecks(failing.id);
    expect(bad.allPass).toBe(false);
    expect(bad.checks[0]).toMatchObject({ figure: "low_corner_hz", max: 20, pass: false });
    expect(bad.checks[0].value as number).toBeGreaterThan(20);
    expect(bad.checks[1]).toMatchObject({ figure: "self_noise_dba_spl", pass: true });
    const fixed = await scene.save(demoWith({}, LOW_CORNER_TARGET), "Back to 22 µF");
    const good = await getRevisionChecks(fixed.id);
    expect(good.allPass).toBe(true);
    expect(good.checks.map((c) => c.pass)).toEqual([true, true]);
    // without targets: figures stored, nothing to pass or fail
    const none = await getRevisionChecks(scene.firstRevisionId);
    expect(none.allPass).toBeNull();
    expect(none.figures.low_corner_hz as number).toBeGreaterThan(5);
    const table = await listDesigns(scene.workspaceId, { sort: "updated", dir: "desc", page: 1, pageSize: 25, show: "active" } as never);
    expect(table.rows[0].status).toBe("draft");
  });
});

describe("a full review", () => {
  it("requests, remarks, marks outdated, decides and sets the design's status", async () => {
    const scene = await reviewScene();
    expect(scene.home.allowSelfApproval).toBe(false);
    const review = await createReview(scene.home, scene.designId, scene.actor("designer"), {
      revisionId: scene.firstRevisionId,
      reviewerIds: [scene.people.reviewerA, scene.people.reviewerB],
      dueAt: "2099-01-31",
      message: "Please look at the output coupling.",
    });
    expect(await scene.status()).toBe("in_review");
    await flushNotificationMail();
    const mail = await waitForMail(scene.emails.reviewerA);
    expect(mail.subject).toMatch(/asks you to review Review bench r1/);
    expect(linkIn(mail.text, "/reviews/")).toContain(`/designs/${scene.designId}/reviews/${review.id}`);
    await waitForMail(scene.emails.reviewerB);
    expect(await unreadCount(scene.people.reviewerA)).toBe(1);

    // remarks by two reviewers: on a part and on a frequency range; a reply and a resolve
    const onPart = await addRemark(review.id, scene.actor("reviewerA"), { body: "COUT looks large for this desk.", anchor: { type: "part", part: "COUT" } });
    const onRange = await addRemark(review.id, scene.actor("reviewerB"), { body: "Bass shelf around 50 Hz?", anchor: { type: "frequency", fromHz: 20, toHz: 200 } });
    await addRemark(review.id, scene.actor("designer"), { body: "It sets the low corner; see the plot.", parentId: onPart.id });
    await setRemarkResolved(onRange.id, scene.actor("reviewerB"), true);
    const designerInbox = await listInbox(scene.people.designer);
    expect(designerInbox.map((n) => n.kind)).toEqual(expect.arrayContaining(["remark.created", "remark.resolved"]));
    expect((await listInbox(scene.people.reviewerA)).map((n) => n.kind)).toContain("remark.replied");

    // a new revision that changes COUT: the part remark is outdated, the range remark is not
    const r2 = await scene.save(demoWith({ part: "COUT", value: "10u" }), "COUT 10 µF");
    const threads = await listThreads(scene.designId, { id: r2.id, circuit: (await scene.revision(r2.id)).circuit });
    const byId = new Map(threads.map((t) => [t.id, t]));
    expect(byId.get(onPart.id)).toMatchObject({ outdated: true, revisionNumber: 1, replies: [expect.objectContaining({ body: expect.stringContaining("low corner") })] });
    expect(byId.get(onRange.id)).toMatchObject({ outdated: false, resolvedAt: expect.any(Date) });
    expect((await listInbox(scene.people.reviewerB)).map((n) => n.kind)).toContain("revision.created");

    // role checks: a viewer cannot decide; the designer cannot approve their own revision here
    await expect(decide(review.id, scene.member("viewer"), { verdict: "approve", reason: "ok" })).rejects.toMatchObject({ code: "forbidden" });
    await expect(decide(review.id, scene.member("designer"), { verdict: "approve", reason: "mine" })).rejects.toMatchObject({ code: "forbidden" });
    // one approval of two keeps the review open; a rework closes it
    expect(await decide(review.id, scene.member("reviewerA"), { verdict: "approve", reason: "Fine by me." })).toMatchObject({ reviewStatus: "open" });
    expect(await scene.status()).toBe("in_review");
    expect(await decide(review.id, scene.member("reviewerB"), { verdict: "rework", reason: "Bass shelf first." })).toMatchObject({ reviewStatus: "rework" });
    expect(await scene.status()).toBe("rework");
    await expect(decide(review.id, scene.member("reviewerA"), { verdict: "approve", reason: "again" })).rejects.toMatchObject({ code: "conflict" });
    const table = await listDesigns(scene.workspaceId, { sort: "updated", dir: "desc", page: 1, pageSize: 25, show: "active" } as never);
    expect(table.rows.find((r) => r.id === scene.designId)?.status).toBe("rework");

    const detail = await getReviewDetail(scene.workspaceId, review.id);
    expect(detail.status).toBe("rework");
    expect(detail.head?.number).toBe(2);
    expect(detail.reviewers.map((r) => r.verdict).sort()).toEqual(["approve", "rework"]);
    await expect(getReviewDetail(crypto.randomUUID(), review.id)).rejects.toMatchObject({ code: "not_found" });

    // a second review of r2, approved by both: the design is approved and r2's record locked
    const second = await createReview(scene.home, scene.designId, scene.actor("designer"), { revisionId: r2.id, reviewerIds: [scene.people.reviewerA] });
    expect(await scene.status()).toBe("in_review");
    await decide(second.id, scene.member("reviewerA"), { verdict: "approve", reason: "Shelf is gone." });
    expect(await scene.status()).toBe("approved");
    expect((await getRevisionChecks(r2.id)).approvedAt).toBeInstanceOf(Date);
    await expect(storeRevisionChecks(r2.id, demoWith())).rejects.toMatchObject({ code: "conflict" });
    expect((await listReviews(scene.designId)).map((r) => r.status)).toEqual(["approved", "rework"]);
  });

  it("lets a designer asked to review approve their own revision where the workspace allows self-approval", async () => {
    const scene = await reviewScene({ allowSelfApproval: true });
    const review = await createReview(scene.home, scene.designId, scene.actor("owner"), {
      revisionId: scene.firstRevisionId,
      reviewerIds: [scene.people.designer],
    });
    await expect(decide(review.id, scene.member("viewer"), { verdict: "rework", reason: "no" })).rejects.toMatchObject({ code: "forbidden" });
    expect(await decide(review.id, scene.member("designer"), { verdict: "approve", reason: "Checked on the bench." })).toMatchObject({ reviewStatus: "approved" });
    expect(await scene.status()).toBe("approved");
  });

  it("refuses reviewers who cannot review, oneself, a past due date and another design's revision", async () => {
    const scene = await reviewScene();
    const ask = (reviewerIds: string[], extra: Record<string, string> = {}) =>
      createReview(scene.home, scene.designId, scene.actor("designer"), { revisionId: scene.firstRevisionId, reviewerIds, ...extra });
    await expect(ask([scene.people.viewer])).rejects.toMatchObject({ code: "invalid_input", fields: { reviewerIds: expect.any(String) } });
    await expect(ask([scene.people.designer])).rejects.toMatchObject({ code: "invalid_input" });
    await expect(ask([scene.people.reviewerA], { dueAt: "2001-01-01" })).rejects.toMatchObject({ code: "invalid_input", fields: { dueAt: expect.any(String) } });
    const other = await reviewScene();
    await expect(
      createReview(scene.home, scene.designId, scene.actor("designer"), { revisionId: other.firstRevisionId, reviewerIds: [scene.people.reviewerA] }),
    ).rejects.toMatchObject({ code: "not_found" });
    expect(await scene.status()).toBe("draft");
  });
});

describe("notification mail", () => {
  it("keeps saving while the mail server is down and retries the copy with backoff", async () => {
    const scene = await reviewScene();
    const review = await createReview(scene.home, scene.designId, scene.actor("designer"), {
      revisionId: scene.firstRevisionId,
      reviewerIds: [scene.people.reviewerA],
    });
    await flushNotificationMail();
    const realSmtp = process.env.SMTP_URL;
    process.env.SMTP_URL = "smtp://127.0.0.1:9"; // nothing listens on the discard port
    try {
      const r2 = await scene.save(demoWith({ part: "COUT", value: "10u" }), "COUT 10 µF while mail is down");
      expect(r2.number).toBe(2);
      const pending = (await listInbox(scene.people.reviewerA)).find((n) => n.kind === "revision.created");
      expect(pending).toBeDefined();
      const before = Date.now();
      expect(await flushNotificationMail()).toMatchObject({ failed: expect.any(Number) });
      const state = await getNotificationMailState(pending!.id);
      expect(state).toMatchObject({ status: "pending", attempts: 1 });
      expect(state.nextAttemptAt!.getTime()).toBeGreaterThan(before + 20_000);
      expect(state.error).toBeTruthy();
    } finally {
      process.env.SMTP_URL = realSmtp;
    }
    const pending = (await listInbox(scene.people.reviewerA)).find((n) => n.kind === "revision.created")!;
    // not due yet: nothing is sent before the backoff has passed
    await flushNotificationMail();
    expect((await getNotificationMailState(pending.id)).status).toBe("pending");
    await flushNotificationMail(new Date(Date.now() + 10 * 60_000));
    expect(await getNotificationMailState(pending.id)).toMatchObject({ status: "sent", attempts: 2 });
    const mail = await waitForMail(scene.emails.reviewerA);
    expect(mail.subject).toMatch(/New revision r2/);
    expect(linkIn(mail.text, "/reviews/")).toContain(review.id);
  });

  it("skips the e-mail copy of a kind the person turned off, keeping the inbox entry", async () => {
    const scene = await reviewScene();
    await setPreferences(scene.people.reviewerA, { emailEnabled: true, email: { "review.requested": false } });
    await createReview(scene.home, scene.designId, scene.actor("designer"), { revisionId: scene.firstRevisionId, reviewerIds: [scene.people.reviewerA, scene.people.reviewerB] });
    const [entryA] = await listInbox(scene.people.reviewerA);
    const [entryB] = await listInbox(scene.people.reviewerB);
    expect(entryA.emailStatus).toBe("skipped");
    expect(entryB.emailStatus).toBe("pending");
  });
});
