import type { ReactNode } from "react";

/** The frame of an application page: an eyebrow, a title, an optional lead, then the content. */
export function PageFrame({
  eyebrow,
  title,
  lead,
  children,
  width = "max-w-4xl",
}: {
  eyebrow?: string;
  title: string;
  lead?: ReactNode;
  children: ReactNode;
  width?: string;
}) {
  return (
    <div className={`mx-auto w-full ${width} px-4 py-10 sm:px-6`}>
      {eyebrow ? <p className="mb-2 font-mono text-xs uppercase tracking-[0.2em] text-brass-deep">{eyebrow}</p> : null}
      <h1 className="text-3xl font-bold text-ink">{title}</h1>
      {lead ? <div className="mt-2 max-w-2xl text-ink-soft">{lead}</div> : null}
      <div className="mt-8">{children}</div>
    </div>
  );
}
