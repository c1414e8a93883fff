"use client";

import { useState } from "react";
import { ANCHOR_TYPES, type AnchorType, createRemarkSchema } from "@/components/schemas/review";
import { primaryButton } from "@/components/ui/buttons";
import { postRemark } from "./reviews-api";
import { useSubmit } from "./use-submit";

const ANCHOR_WORDS: Record<AnchorType, string> = { part: "A part", net: "A net", frequency: "A frequency range", figure: "A figure" };

const input = "w-full rounded-md border border-rule bg-white/70 px-2 py-1.5 text-sm outline-none focus:border-brass aria-[invalid]:border-caution";

/** A new remark: what it is about (part, net, frequency range on a plot, figure) and the text. */
export function NewRemarkForm({ reviewId, parts, nets, figures }: { reviewId: string; parts: string[]; nets: string[]; figures: string[] }) {
  const [type, setType] = useState<AnchorType>("part");
  const [part, setPart] = useState(parts[0] ?? "");
  const [net, setNet] = useState(nets[0] ?? "");
  const [figure, setFigure] = useState(figures[0] ?? "");
  const [from, setFrom] = useState("20");
  const [to, setTo] = useState("200");
  const [body, setBody] = useState("");
  const { submit, error, fields, busy } = useSubmit(createRemarkSchema, (data) => postRemark(reviewId, data), () => setBody(""));
  const anchor =
    type === "part" ? { type, part } : type === "net" ? { type, net } : type === "figure" ? { type, figure } : { type, fromHz: Number(from), toHz: Number(to) };
  return (
    <form
      aria-label="New remark"
      className="space-y-3"
      onSubmit={(event) => {
        event.preventDefault();
        void submit({ body, anchor });
      }}
    >
      <fieldset className="space-y-2">
        <legend className="text-sm font-medium">About</legend>
        <div className="flex flex-wrap gap-x-3 gap-y-1 text-sm">
          {ANCHOR_TYPES.map((t) => (
            <label key={t} className="flex items-center gap-1">
              <input type="radio" name="anchor-type" value={t} checked={type === t} onChange={() => setType(t)} /> {ANCHOR_WORDS[t]}
            </label>
          ))}
        </div>
        {type === "part" ? (
          <select aria-label="Part" value={part} onChange={(e) => setPart(e.target.value)} className={input}>
            {parts.map((p) => (
              <option key={p}>{p}</option>
            ))}
          </select>
        ) : null}
        {type === "net" ? (
          <select aria-label="Net" value={net} onChange={(e) => setNet(e.target.value)} className={input}>
            {nets.map((n) => (
              <option key={n}>{n}</option>
            ))}
          </select>
        ) : null}
        {type === "figure" ? (
          <select aria-label="Figure" value={figure} onChange={(e) => setFigure(e.target.value)} className={input}>
            {figures.map((f) => (
              <option key={f}>{f}</option>
            ))}
          </select>
        ) : null}
        {type === "frequency" ? (
          <div className="grid grid-cols-2 gap-2">
            <label className="text-xs">
              From (Hz)
              <input inputMode="decimal" value={from} onChange={(e) => setFrom(e.target.value)} className={input} aria-invalid={fields["anchor.fromHz"] ? true : undefined} />
            </label>
            <label className="text-xs">
              To (Hz)
              <input inputMode="decimal" value={to} onChange={(e) => setTo(e.target.value)} className={input} aria-invalid={fields["anchor.toHz"] ? true : undefined} />
            </label>
          </div>
        ) : null}
      </fieldset>
      <label className="block text-sm font-medium" htmlFor="remark-body">
        Remark
      </label>
      <textarea id="remark-body" rows={3} value={body} onChange={(e) => setBody(e.target.value)} className={input} aria-invalid={fields.body ? true : undefined} />
      {error ? (
        <p role="alert" className="text-sm text-caution">
          {error}
        </p>
      ) : null}
      <button type="submit" className={primaryButton} disabled={busy}>
        Add remark
      </button>
    </form>
  );
}
