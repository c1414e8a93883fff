/** The parts of a circuit file with their values as written, and its variants: the read-only "what is in it". */
type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => typeof v === "object" && v !== null && !Array.isArray(v);
const text = (v: unknown) => (typeof v === "string" || typeof v === "number" ? String(v) : JSON.stringify(v));

export function PartsList({ circuit }: { circuit: unknown }) {
  const file = isObject(circuit) ? circuit : {};
  const parts = (Array.isArray(file.parts) ? file.parts : []).filter(isObject);
  const variants = (Array.isArray(file.variants) ? file.variants : []).filter(isObject);
  const parameters = isObject(file.parameters) ? Object.entries(file.parameters) : [];
  return (
    <div className="space-y-4">
      {parts.length === 0 ? (
        <p className="text-sm text-ink-soft">This circuit has no parts yet.</p>
      ) : (
        <div className="overflow-x-auto rounded-md border border-rule">
          <table className="w-full text-left text-sm sm:min-w-[32rem]">
            <caption className="sr-only">Parts and their values</caption>
            <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th className="px-3 py-2 font-medium">Part</th>
                <th className="px-3 py-2 font-medium">Kind</th>
                <th className="px-3 py-2 font-medium">Values</th>
                <th className="hidden px-3 py-2 font-medium sm:table-cell">Nets</th>
              </tr>
            </thead>
            <tbody>
              {parts.map((part) => (
                <tr key={text(part.id)} className={`border-t border-rule ${part.enabled === false ? "text-ink-soft" : ""}`}>
                  <td className="px-3 py-1.5 font-mono">
                    {text(part.id)}
                    {part.enabled === false ? <span className="ml-2 font-sans text-xs">(switched off)</span> : null}
                  </td>
                  <td className="px-3 py-1.5">{text(part.kind)}</td>
                  <td className="break-words px-3 py-1.5 font-mono text-xs [overflow-wrap:anywhere]">
                    {Object.entries(isObject(part.values) ? part.values : {})
                      .map(([k, v]) => `${k} ${text(v)}`)
                      .join(" · ")}
                  </td>
                  <td className="hidden px-3 py-1.5 font-mono text-xs text-ink-soft sm:table-cell">
                    {Object.values(isObject(part.pins) ? part.pins : {})
                      .map(text)
                      .join(", ")}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {parameters.length > 0 ? (
        <p className="text-sm">
          <span className="text-ink-soft">Parameters: </span>
          <span className="font-mono text-xs">{parameters.map(([k, v]) => `${k} = ${text(v)}`).join(" · ")}</span>
        </p>
      ) : null}
      <div className="text-sm">
        <span className="text-ink-soft">Variants: </span>
        {variants.length === 0 ? (
          "none"
        ) : (
          <ul className="mt-1 space-y-0.5">
            {variants.map((v) => (
              <li key={text(v.name)}>
                <span className="font-medium">{text(v.name)}</span>
                <span className="ml-2 font-mono text-xs text-ink-soft">
                  {[
                    ...Object.entries(isObject(v.parameters) ? v.parameters : {}).map(([k, x]) => `${k} = ${text(x)}`),
                    ...(Array.isArray(v.enable) && v.enable.length ? [`on: ${v.enable.map(text).join(", ")}`] : []),
                    ...(Array.isArray(v.disable) && v.disable.length ? [`off: ${v.disable.map(text).join(", ")}`] : []),
                  ].join(" · ")}
                </span>
              </li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
