/**
 * The demo review at Larkfield Acoustics: the LA-47 (in review in the demo designs) has a review of its latest
 * revision asked by Ines of Margit and Orla, with remarks on a part and on a frequency range, a reply, and the
 * reviewers' inbox entries. Idempotent: a design that already has a review is left as it is. Invented people and text.
 */
import { and, desc, eq, isNull } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import { designRevisions, designs, notifications, remarks, reviewReviewers, reviews, users, workspaces } from "./schema";

// biome-ignore lint/suspicious/noExplicitAny: the seed's drizzle handle is created without the schema generic
type SeedDb = NodePgDatabase<any>;

const DESIGN_TITLE = "LA-47 studio condenser";
const INES = "ines@larkfield.example";
const MARGIT = "margit@larkfield.example";
const ORLA = "orla@larkfield.example";
const TOMAS = "tomas@larkfield.example";

const DAY_MS = 24 * 3600_000;

export async function seedReviews(db: SeedDb, workspaceId: string): Promise<void> {
  const [design] = await db
    .select({ id: designs.id, slug: workspaces.slug })
    .from(designs)
    .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
    .where(and(eq(designs.workspaceId, workspaceId), eq(designs.title, DESIGN_TITLE), isNull(designs.deletedAt)));
  if (!design) return;
  const existing = await db.select({ id: reviews.id }).from(reviews).where(eq(reviews.designId, design.id)).limit(1);
  if (existing.length > 0) return;
  const [revision] = await db
    .select({ id: designRevisions.id, number: designRevisions.number })
    .from(designRevisions)
    .where(eq(designRevisions.designId, design.id))
    .orderBy(desc(designRevisions.number))
    .limit(1);
  const person = async (email: string) => (await db.select({ id: users.id }).from(users).where(eq(users.email, email)))[0]?.id;
  // one after another: `db` is a transaction, one connection, which takes one query at a time (pg warns on more and
  // refuses from pg 9)
  const ines = await person(INES);
  const margit = await person(MARGIT);
  const orla = await person(ORLA);
  const tomas = await person(TOMAS);
  if (!revision || !ines || !margit || !orla || !tomas) return;
  const now = Date.now();
  const [review] = await db
    .insert(reviews)
    .values({
      designId: design.id,
      revisionId: revision.id,
      requestedBy: ines,
      message: "The 2G2 bias resistors move the low corner down. Please check the bias network and the bass response before we build the first batch.",
      dueAt: new Date(now + 5 * DAY_MS),
      createdAt: new Date(now - 2 * DAY_MS),
    })
    .returning({ id: reviews.id });
  await db.insert(reviewReviewers).values([
    { reviewId: review.id, userId: margit },
    { reviewId: review.id, userId: orla },
  ]);
  const base = { designId: design.id, revisionId: revision.id, reviewId: review.id };
  const [onPart] = await db
    .insert(remarks)
    .values({
      ...base,
      authorId: margit,
      body: "RG at 2G2 with the 1 nF coupling cap: is the gate still settled within a second after phantom comes up?",
      anchor: { type: "part", part: "RG" },
      createdAt: new Date(now - DAY_MS),
    })
    .returning({ id: remarks.id });
  await db.insert(remarks).values([
    { ...base, parentId: onPart.id, authorId: ines, body: "About 2 s to within 1 %. I will try 1G5 in the next revision.", anchor: { type: "part", part: "RG" }, createdAt: new Date(now - DAY_MS + 3600_000) },
    {
      ...base,
      authorId: orla,
      body: "The response lifts a little between 40 and 120 Hz into the 1k2 desk. Intended?",
      anchor: { type: "frequency", fromHz: 40, toHz: 120 },
      createdAt: new Date(now - DAY_MS + 7200_000),
    },
  ]);
  const link = `/w/${design.slug}/designs/${design.id}/reviews/${review.id}`;
  await db.insert(notifications).values([
    { userId: margit, kind: "review.requested", title: `Ines Caldero asks you to review ${DESIGN_TITLE} r${revision.number}`, body: "Please check the bias network.", link, emailStatus: "skipped" },
    { userId: orla, kind: "review.requested", title: `Ines Caldero asks you to review ${DESIGN_TITLE} r${revision.number}`, body: "Please check the bias network.", link, emailStatus: "skipped" },
    { userId: ines, kind: "remark.created", title: `Orla Penhallow remarked on 40 Hz – 120 Hz of ${DESIGN_TITLE}`, body: "The response lifts a little between 40 and 120 Hz.", link, emailStatus: "skipped" },
    { userId: tomas, kind: "remark.created", title: `Margit Solberg remarked on part RG of ${DESIGN_TITLE}`, body: "RG at 2G2 with the 1 nF coupling cap…", link, emailStatus: "skipped" },
  ]);
}
