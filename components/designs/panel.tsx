import type { ReactNode } from "react";

/** A titled box of the design page's side column. */
export function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section aria-label={title} className="space-y-3 rounded-md border border-rule bg-paper p-4">
      <h2 className="font-display text-base font-semibold">{title}</h2>
      {children}
    </section>
  );
}
