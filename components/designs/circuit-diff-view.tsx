import type { CircuitDiff, ValueChange } from "./circuit-diff";

const show = (v: string | null) => (v === null ? "—" : v);

function Changes({ changes }: { changes: ValueChange[] }) {
  return (
    <>
      {changes.map((c) => (
        <span key={c.name} className="mr-3 inline-block font-mono text-xs">
          {c.name} <del className="text-caution">{show(c.before)}</del> → <ins className="text-trace no-underline">{show(c.after)}</ins>
        </span>
      ))}
    </>
  );
}

/** What changed between a revision and its parent, in a person's words. */
export function CircuitDiffView({ diff, parentNumber }: { diff: CircuitDiff; parentNumber: number | null }) {
  if (parentNumber === null) return <p className="text-sm text-ink-soft">The first revision: {diff.partsAdded.length} parts.</p>;
  if (diff.same) return <p className="text-sm text-ink-soft">The circuit is the same as r{parentNumber}.</p>;
  return (
    <ul className="space-y-1.5 text-sm">
      {diff.title ? (
        <li>
          Title: <del className="text-caution">{diff.title.before}</del> → <ins className="text-trace no-underline">{diff.title.after}</ins>
        </li>
      ) : null}
      {diff.partsAdded.map((p) => (
        <li key={`+${p.id}`}>
          <span className="font-semibold text-trace">Added</span> <span className="font-mono">{p.id}</span> ({p.kind})
          <span className="ml-2 font-mono text-xs text-ink-soft">
            {Object.entries(p.values)
              .map(([k, v]) => `${k} ${v}`)
              .join(" · ")}
          </span>
        </li>
      ))}
      {diff.partsRemoved.map((p) => (
        <li key={`-${p.id}`}>
          <span className="font-semibold text-caution">Removed</span> <span className="font-mono">{p.id}</span> ({p.kind})
        </li>
      ))}
      {diff.partsChanged.map((p) => (
        <li key={`~${p.id}`}>
          <span className="font-semibold text-brass-deep">Changed</span> <span className="font-mono">{p.id}</span>
          {p.kindBefore ? ` (${p.kindBefore} → ${p.kind})` : ""}
          {p.enabled ? ` ${p.enabled.after ? "switched on" : "switched off"}` : ""}{" "}
          <Changes changes={p.values} />
          {p.pins.length ? (
            <>
              <span className="text-xs text-ink-soft">pins </span>
              <Changes changes={p.pins} />
            </>
          ) : null}
          {p.tolerance.length ? (
            <>
              <span className="text-xs text-ink-soft">tolerance </span>
              <Changes changes={p.tolerance} />
            </>
          ) : null}
        </li>
      ))}
      {diff.parameters.length ? (
        <li>
          <span className="font-semibold text-brass-deep">Parameters</span> <Changes changes={diff.parameters} />
        </li>
      ) : null}
      {diff.variantsAdded.length ? <li>Variants added: {diff.variantsAdded.join(", ")}</li> : null}
      {diff.variantsRemoved.length ? <li>Variants removed: {diff.variantsRemoved.join(", ")}</li> : null}
      {diff.output ? (
        <li>
          Output: {diff.output.before} → {diff.output.after}
        </li>
      ) : null}
    </ul>
  );
}
