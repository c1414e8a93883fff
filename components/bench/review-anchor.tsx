"use client";
/**
 * Opens the bench at a remark's anchor: `?part=J1` selects the part (its sheet opens as for a click), `?net=out`
 * selects the parts on that net, `?from=20&to=200` and `?figure=low_corner_hz` name the range or figure in a strip
 * above the canvas (the range also zooms the magnitude plot, components/bench/anchor-range.ts), so a reviewer's
 * remark and the bench show the same thing.
 */
import { useSearchParams } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { anchorRange } from "./anchor-range";
import { useBench, useBenchStore } from "./store/bench-store-context";

function describe(params: URLSearchParams): string | null {
  const range = anchorRange(params);
  if (range) return `Remark about ${range.fromHz} Hz – ${range.toHz} Hz (the magnitude plot is zoomed to it)`;
  if (params.get("figure")) return `Remark about the figure ${params.get("figure")}`;
  if (params.get("net")) return `Remark about net ${params.get("net")} (its parts are selected)`;
  if (params.get("part")) return `Remark about part ${params.get("part")}`;
  return null;
}

export function ReviewAnchor() {
  const params = useSearchParams();
  const store = useBenchStore();
  const parts = useBench((s) => s.document.circuit.parts);
  const [shown, setShown] = useState(true);
  const part = params.get("part");
  const net = params.get("net");
  const applied = useRef<string | null>(null);
  // applied once per anchor: afterwards the person's own clicks and edits decide the selection
  useEffect(() => {
    const key = `${part}|${net}`;
    if (applied.current === key) return;
    applied.current = key;
    if (part && parts.some((p) => p.id === part)) store.getState().select({ parts: [part] });
    else if (net) {
      const onNet = parts.filter((p) => Object.values(p.pins ?? {}).includes(net)).map((p) => p.id);
      if (onNet.length > 0) store.getState().select({ parts: onNet });
    }
  }, [part, net, store, parts]);
  const text = describe(params);
  if (!text || !shown) return null;
  const missing = part && !parts.some((p) => p.id === part) ? ` — there is no part ${part} in this revision` : "";
  return (
    <div role="status" data-testid="review-anchor" className="flex items-center gap-2 border-b border-brass/40 bg-brass-light/30 px-4 py-1 text-xs text-ink">
      <span>
        {text}
        {missing}
      </span>
      <button type="button" className="ml-auto underline" onClick={() => setShown(false)}>
        Hide
      </button>
    </div>
  );
}
