/** Button looks shared by forms and lists, matching the landing page's buttons. */
export const primaryButton =
  "inline-flex items-center justify-center rounded-md bg-ink px-4 py-2 font-medium text-paper hover:bg-graphite disabled:cursor-not-allowed disabled:opacity-60";
export const secondaryButton =
  "inline-flex items-center justify-center rounded-md border border-ink px-4 py-2 font-medium text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-60";
export const dangerButton =
  "inline-flex items-center justify-center rounded-md border border-caution px-3 py-1.5 text-sm font-medium text-caution hover:bg-caution-bg disabled:cursor-not-allowed disabled:opacity-60";
