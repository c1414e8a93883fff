import "server-only";

/**
 * The frame of every Backplate mail: a plain-text body and a small HTML body with one button. The HTML uses inline
 * styles only (mail readers ignore style sheets) in the landing page's paper, ink and brass colours.
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[ch] ?? ch);
}

export function mailBodies(options: { heading: string; lines: string[]; action: { label: string; url: string }; footer: string }) {
  const text = [options.heading, "", ...options.lines, "", `${options.action.label}: ${options.action.url}`, "", options.footer].join("\n");
  const paragraphs = options.lines.map((line) => `<p style="margin:0 0 12px">${escapeHtml(line)}</p>`).join("");
  const html = `<!doctype html><html><body style="margin:0;background:#f4f0e6;font-family:Helvetica,Arial,sans-serif;color:#15181c">
<div style="max-width:520px;margin:0 auto;padding:32px 24px">
<p style="margin:0 0 24px;font-weight:bold;font-size:18px">Backplate</p>
<h1 style="font-size:22px;margin:0 0 16px">${escapeHtml(options.heading)}</h1>${paragraphs}
<p style="margin:24px 0"><a href="${escapeHtml(options.action.url)}" style="background:#15181c;color:#f4f0e6;padding:10px 18px;border-radius:6px;text-decoration:none;display:inline-block">${escapeHtml(options.action.label)}</a></p>
<p style="margin:0;font-size:12px;color:#3c434b">${escapeHtml(options.footer)}</p>
</div></body></html>`;
  return { text, html };
}
