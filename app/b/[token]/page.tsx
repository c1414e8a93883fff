import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { CautionBanner } from "@/components/bench/caution-banner";
import { openDocument } from "@/components/bench/document/document";
import { RevisionReadout } from "@/components/designs/revision-readout";
import { runSavedRevision } from "@/app/_server/revision-runs";
import { openBenchLink } from "../open-bench-link";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Bench link", robots: { index: false } };

/** A bench link opened read-only: the revision's figures, response and parts, as the link's view asks. */
export default async function BenchLinkPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const opening = await openBenchLink(token);
  if (opening.kind === "gone") redirect(`/b/gone?reason=${opening.reason}`);
  if (opening.kind === "missing") notFound();
  if (opening.kind === "sign-in") redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/b/${token}`)}`);
  const { link, revision } = opening;
  const view = link.view;
  const run = runSavedRevision(revision.id, revision.circuit, view.variant);
  // The same caution the bench shows, from the same rule (components/bench/document/hazards.ts): someone opening a
  // shared link is as likely to build the circuit as its designer.
  const { circuit } = openDocument(revision.circuit);
  return (
    <div className="mx-auto max-w-5xl space-y-6 px-4 py-8 sm:px-6">
      <header className="space-y-2 border-b border-rule pb-4">
        <p className="font-mono text-xs uppercase tracking-wider text-brass-deep">Bench link · read-only · {link.workspaceName}</p>
        <h1 className="font-display text-2xl font-bold text-ink sm:text-3xl">{link.designTitle}</h1>
        <p className="text-sm text-ink-soft">
          Revision r{revision.number} by {revision.authorName ?? "a former member"}, {revision.createdAt.toISOString().slice(0, 16).replace("T", " ")} UTC
          {link.pinnedRevisionId ? "" : " (this link follows the latest revision)"} — “{revision.message}”
        </p>
        <ul className="flex flex-wrap gap-2 text-xs" aria-label="The view this link opens">
          <li className="rounded-full border border-rule bg-paper-deep px-2.5 py-0.5">Plot: {view.plot}</li>
          <li className="rounded-full border border-rule bg-paper-deep px-2.5 py-0.5">Variant: {view.variant || "as drawn"}</li>
          {view.destination ? <li className="rounded-full border border-rule bg-paper-deep px-2.5 py-0.5">Destination: {view.destination}</li> : null}
          {view.fromHz || view.toHz ? (
            <li className="rounded-full border border-rule bg-paper-deep px-2.5 py-0.5">
              Range: {view.fromHz ?? 1}–{view.toHz ?? 100000} Hz
            </li>
          ) : null}
          <li className="rounded-full border border-rule px-2.5 py-0.5 text-ink-soft">Opened {opening.accessCount} time{opening.accessCount === 1 ? "" : "s"}</li>
          {link.expiresAt ? <li className="rounded-full border border-rule px-2.5 py-0.5 text-ink-soft">Expires {link.expiresAt.toISOString().slice(0, 10)}</li> : null}
        </ul>
      </header>
      <CautionBanner circuit={circuit} opNets={run.ok ? (run.document.op?.nets ?? null) : null} />
      <RevisionReadout run={run} circuit={revision.circuit} view={view} />
      <p className="text-xs text-ink-soft">
        Computed on the server by Backplate's engine{run.ok ? ` in ${Math.round(run.ms)} ms` : ""}. <Link href="/" className="underline">About Backplate</Link>
      </p>
    </div>
  );
}
