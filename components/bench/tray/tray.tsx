"use client";
/**
 * The tray: every kind, grouped; drag one onto the canvas, or click (or press Enter on) it to place it at the
 * centre of the view. New parts get the next free designator and the defaults of part-defaults.ts.
 */
import { useReactFlow } from "@xyflow/react";
import type { PartKind } from "@/sim/circuit/types";
import { boxCentredOn } from "../document/free-spot";
import { nextFreeId } from "../document/ids";
import { netNames } from "../document/nets";
import { canvasCentre, KIND_DRAG_TYPE } from "../canvas/canvas-centre";
import { useBenchStore } from "../store/bench-store-context";
import { KIND_LABELS } from "../symbols/kind-names";
import { GroundSymbol, PartSymbol } from "../symbols/part-symbol";
import { SYMBOL_BOXES } from "../symbols/pin-layout";
import { TRAY_GROUPS, TRAY_HINTS, type TrayItem } from "./tray-groups";

const LABELS: Record<TrayItem, string> = { ...KIND_LABELS, ground: "Ground", label: "Net label" };
// two lines at most in the tray's width, so every entry fits at 1440×900 (the title says it in full)
const SHORT: Partial<Record<TrayItem, string>> = {
  vcvs: "Controlled voltage source",
  vccs: "Controlled current source",
};

function TrayIcon({ item }: { item: TrayItem }) {
  if (item === "ground") return <GroundSymbol className="h-6 w-6" />;
  if (item === "label") {
    return (
      <span className="flex h-5 items-center rounded-r-full border border-trace bg-trace-light px-1.5 font-mono text-[9px]">
        net
      </span>
    );
  }
  const box = SYMBOL_BOXES[item];
  const scale = Math.min(40 / box.width, 24 / box.height);
  return (
    <span className="flex h-6 w-10 items-center justify-center">
      <span style={{ transform: `scale(${scale})`, width: box.width, height: box.height }} className="block shrink-0">
        <PartSymbol kind={item as PartKind} />
      </span>
    </span>
  );
}

export function Tray() {
  const store = useBenchStore();
  const flow = useReactFlow();

  const add = (item: TrayItem) => {
    const at = canvasCentre(flow);
    const state = store.getState();
    if (item === "ground") state.addGround(at);
    else if (item === "label") state.addNetLabel(at, nextFreeId("net", netNames(state.document.circuit)));
    // a part already there pushes the new one to the nearest free grid space (edits.addPart)
    else state.addPart(item, boxCentredOn(item, at));
  };

  return (
    <nav aria-label="Tray" className="h-full overflow-y-auto px-2 py-3">
      {TRAY_GROUPS.map((group) => (
        <section key={group.title} className="mb-2">
          <h3 className="mb-1 px-1 font-display text-[11px] tracking-wide text-brass-deep uppercase">{group.title}</h3>
          <ul className="space-y-0.5">
            {group.items.map((item) => (
              <li key={item}>
                <button
                  type="button"
                  draggable
                  onDragStart={(e) => {
                    e.dataTransfer.setData(KIND_DRAG_TYPE, item);
                    e.dataTransfer.effectAllowed = "copy";
                  }}
                  onClick={() => add(item)}
                  title={`${LABELS[item]}: ${TRAY_HINTS[item]}. Drag onto the canvas or click to add.`}
                  data-tray-item={item}
                  className="flex w-full cursor-grab items-center gap-2 rounded px-1 py-0.5 text-left text-[13px] text-ink hover:bg-paper-deep active:cursor-grabbing"
                >
                  <span className="text-ink-soft">
                    <TrayIcon item={item} />
                  </span>
                  <span className="leading-tight">{SHORT[item] ?? LABELS[item]}</span>
                </button>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </nav>
  );
}
