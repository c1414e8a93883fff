import { readCapturedMail } from "../../app/_server/captured-mail";

/**
 * The newest captured message to `to`, waiting briefly for the fake to write it. Links are read from the raw text
 * with quoted-printable soft breaks and =3D undone too, in case a body arrives undecoded.
 */
export async function waitForMail(to: string, timeoutMs = 5_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = readCapturedMail()?.find((mail) => mail.to.includes(to));
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`No mail to ${to} within ${timeoutMs} ms`);
}

export function linkIn(text: string, pathPart: string): string {
  const plain = text.replace(/=\r?\n/g, "").replace(/=3D/g, "=");
  const match = new RegExp(`https?://[^\\s"<>]*${pathPart.replace(/[/]/g, "\\/")}[^\\s"<>]*`).exec(plain);
  if (!match) throw new Error(`No link with ${pathPart} in:\n${plain}`);
  return match[0];
}
