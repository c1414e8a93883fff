/** Plot colours from the theme (app/globals.css): the live result in trace teal, overlays in brass and ink tones. */
export const PLOT_COLOURS = {
  trace: "#24706b",
  traceLight: "#9fd1c9",
  ink: "#15181c",
  inkSoft: "#3c434b",
  rule: "#d8cfbd",
  paper: "#f4f0e6",
  pinned: "#3c434b",
} as const;

/** Overlay curves cycle through these (brass, brass-deep, caution, graphite, a lighter teal, a muted plum). */
export const OVERLAY_COLOURS = ["#b27a24", "#8a5c14", "#b4410b", "#23282e", "#4c9c94", "#7a4e6e", "#c9a35a", "#5d6a75"];

export function overlayColour(index: number): string {
  return OVERLAY_COLOURS[index % OVERLAY_COLOURS.length];
}
