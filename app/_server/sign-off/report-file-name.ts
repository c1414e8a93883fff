/** "<title>-r<n>-sign-off.pdf" in plain ASCII, safe inside a Content-Disposition header and a storage key. */
export function reportFileName(title: string, revisionNumber: number): string {
  const stem = title.normalize("NFKD").replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase().slice(0, 60) || "design";
  return `${stem}-r${revisionNumber}-sign-off.pdf`;
}
