import type { ReactNode } from "react";

/** The two-column frame of the sign-in, sign-up and reset pages: words on the left, the form on a card. */
export function AuthPanel({ eyebrow, title, lead, children }: { eyebrow: string; title: string; lead: ReactNode; children: ReactNode }) {
  return (
    <div className="mx-auto grid w-full max-w-5xl gap-10 px-4 py-12 sm:px-6 md:grid-cols-[1fr_1.1fr]">
      <section>
        <p className="mb-2 font-mono text-xs uppercase tracking-[0.2em] text-brass-deep">{eyebrow}</p>
        <h1 className="text-3xl font-bold text-ink sm:text-4xl">{title}</h1>
        <div className="mt-3 max-w-md text-ink-soft">{lead}</div>
      </section>
      <section className="flex flex-col gap-6 rounded-lg border border-rule bg-paper-deep/60 p-6">{children}</section>
    </div>
  );
}
