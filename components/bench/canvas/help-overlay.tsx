"use client";
/** The list of shortcuts and gestures, opened with "?". */
import { GESTURES, SHORTCUTS } from "./shortcuts";

export function HelpOverlay({ onClose }: { onClose: () => void }) {
  return (
    <div
      role="dialog"
      aria-modal="true"
      aria-labelledby="bench-help-title"
      className="absolute inset-0 z-20 flex items-start justify-center overflow-auto bg-ink/30 p-6"
      onClick={onClose}
      onKeyDown={(e) => e.key === "Escape" && onClose()}
    >
      <div
        className="w-full max-w-lg rounded-md border border-rule bg-paper p-5 shadow-lg"
        onClick={(e) => e.stopPropagation()}
        onKeyDown={(e) => e.stopPropagation()}
        role="document"
      >
        <div className="mb-3 flex items-center justify-between">
          <h2 id="bench-help-title" className="font-display text-lg text-ink">
            Bench shortcuts
          </h2>
          <button type="button" onClick={onClose} className="rounded px-2 py-1 text-sm text-ink-soft hover:bg-paper-deep">
            Close
          </button>
        </div>
        <table className="w-full text-sm">
          <tbody>
            {[...SHORTCUTS, ...GESTURES].map((s) => (
              <tr key={s.keys} className="border-t border-rule">
                <td className="py-1.5 pr-4 align-top font-mono text-xs whitespace-nowrap text-ink">{s.keys}</td>
                <td className="py-1.5 text-ink-soft">{s.does}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
