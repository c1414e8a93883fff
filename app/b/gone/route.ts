/**
 * The page a revoked or expired bench link lands on, answered with 410 Gone (a page component cannot set a status,
 * so /b/<token> redirects here). Self-contained HTML in Backplate's colours so it reads the same without scripts.
 */
const MESSAGES: Record<string, { title: string; body: string }> = {
  revoked: { title: "This bench link was revoked", body: "The design's team withdrew this link. Ask them for a new one." },
  expired: { title: "This bench link has expired", body: "The link was made to stop working after a set time. Ask the design's team for a new one." },
  deleted: { title: "This design was deleted", body: "The design behind this link is no longer available." },
  empty: { title: "Nothing to show yet", body: "The design behind this link has no saved revision." },
};

const escapeHtml = (s: string) => s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c] ?? c);

export function GET(request: Request) {
  const reason = new URL(request.url).searchParams.get("reason") ?? "";
  const text = MESSAGES[reason] ?? { title: "This bench link no longer works", body: "Ask the design's team for a new one." };
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(text.title)} · Backplate</title><style>
body{margin:0;background:#f4f0e6;color:#15181c;font-family:ui-sans-serif,system-ui,sans-serif}
header{background:#15181c;color:#f4f0e6;padding:14px 24px;font-weight:700;letter-spacing:-.01em}
main{max-width:36rem;margin:12vh auto;padding:0 24px}
.code{font-family:ui-monospace,monospace;color:#8a5c14;font-size:.85rem}
h1{font-size:1.6rem;margin:.3rem 0 .8rem}p{color:#3c434b;line-height:1.5}a{color:#24706b}
.card{border:1px solid #d8cfbd;border-left:4px solid #b27a24;background:#fff8;padding:20px 24px;border-radius:6px}
</style></head><body><header>Backplate</header><main><div class="card"><div class="code">410 · bench link</div>
<h1>${escapeHtml(text.title)}</h1><p>${escapeHtml(text.body)}</p><p><a href="/">Backplate home</a></p></div></main></body></html>`;
  return new Response(html, { status: 410, headers: { "Content-Type": "text/html; charset=utf-8", "Cache-Control": "no-store" } });
}
