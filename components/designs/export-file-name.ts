/**
 * The download name of an exported revision: "<title>-r<n>.json". The plain form keeps to characters every browser
 * and file system accepts (quotes, slashes and control characters would break the header or the path); the UTF-8
 * form (RFC 6266 filename*) keeps the title as written.
 */
export function exportFileName(title: string, revisionNumber: number): { ascii: string; utf8: string } {
  const name = `${title.trim() || "design"}-r${revisionNumber}.json`;
  const ascii = name
    .normalize("NFKD")
    .replace(/[^\x20-\x7e]/g, "")
    .replace(/["\\/:*?<>|]+/g, "-")
    .replace(/\s+/g, " ")
    .trim();
  return { ascii: ascii || `design-r${revisionNumber}.json`, utf8: encodeURIComponent(name) };
}
