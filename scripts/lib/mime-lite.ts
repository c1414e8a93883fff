/**
 * Just enough MIME reading for the mail fake: the headers, and the text/plain and text/html parts of the messages
 * nodemailer writes (single part or multipart/alternative/mixed; 7bit, 8bit, quoted-printable or base64 bodies;
 * RFC 2047 encoded words in headers). Not a general mail parser.
 */
export interface ParsedMail {
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  date: string;
}

type Headers = Map<string, string>;

function splitHead(raw: string): { headers: Headers; body: string } {
  const normal = raw.replace(/\r\n/g, "\n");
  const cut = normal.indexOf("\n\n");
  const head = cut === -1 ? normal : normal.slice(0, cut);
  const body = cut === -1 ? "" : normal.slice(cut + 2);
  const headers: Headers = new Map();
  // Folded header lines continue with leading white space.
  for (const line of head.replace(/\n[ \t]+/g, " ").split("\n")) {
    const colon = line.indexOf(":");
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

export function decodeQuotedPrintable(text: string): string {
  const bytes: number[] = [];
  const soft = text.replace(/=\r?\n/g, "");
  for (let i = 0; i < soft.length; i++) {
    const ch = soft[i];
    if (ch === "=" && /^[0-9A-Fa-f]{2}$/.test(soft.slice(i + 1, i + 3))) {
      bytes.push(Number.parseInt(soft.slice(i + 1, i + 3), 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(ch, "utf8"));
    }
  }
  return Buffer.from(bytes).toString("utf8");
}

function decodeBody(body: string, encoding: string | undefined): string {
  switch ((encoding ?? "7bit").toLowerCase()) {
    case "quoted-printable":
      return decodeQuotedPrintable(body);
    case "base64":
      return Buffer.from(body.replace(/\s+/g, ""), "base64").toString("utf8");
    default:
      return body;
  }
}

/** RFC 2047: =?charset?Q?…?= and =?charset?B?…?= in Subject and address headers. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, "?==?")
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_all, _charset, kind: string, data: string) =>
      kind.toUpperCase() === "B"
        ? Buffer.from(data, "base64").toString("utf8")
        : decodeQuotedPrintable(data.replace(/_/g, " ")),
    );
}

function boundaryOf(contentType: string): string | null {
  const match = /boundary="?([^";]+)"?/i.exec(contentType);
  return match ? match[1] : null;
}

function collectParts(headers: Headers, body: string, out: { text: string; html: string }) {
  const type = (headers.get("content-type") ?? "text/plain").toLowerCase();
  if (type.startsWith("multipart/")) {
    const boundary = boundaryOf(headers.get("content-type") ?? "");
    if (!boundary) return;
    for (const chunk of body.split(`--${boundary}`).slice(1)) {
      if (chunk.startsWith("--")) break;
      const part = splitHead(chunk.replace(/^\n/, ""));
      collectParts(part.headers, part.body, out);
    }
    return;
  }
  const decoded = decodeBody(body, headers.get("content-transfer-encoding")).replace(/\n$/, "");
  if (type.startsWith("text/html") && !out.html) out.html = decoded;
  else if (type.startsWith("text/plain") && !out.text) out.text = decoded;
}

export function parseMail(raw: string, envelopeTo: string[], receivedAt: Date): ParsedMail {
  const { headers, body } = splitHead(raw);
  const out = { text: "", html: "" };
  collectParts(headers, body, out);
  return {
    to: envelopeTo,
    from: decodeEncodedWords(headers.get("from") ?? ""),
    subject: decodeEncodedWords(headers.get("subject") ?? ""),
    text: out.text,
    html: out.html,
    date: receivedAt.toISOString(),
  };
}
