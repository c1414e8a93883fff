/** New people for app tests, made through the real API (sign-up, then next-auth's password sign-in). */
import { randomUUID } from "node:crypto";
import { linkIn } from "../integration/captured-mail-helpers";
import { type HttpSession, originHeader, signInWithPassword } from "./http-session";

export { linkIn };

export const NEW_PASSWORD = "a-long-enough-password";

export interface TestPerson {
  email: string;
  name: string;
  id: string;
  session: HttpSession;
}

export async function signUp(baseUrl: string, label: string): Promise<TestPerson> {
  const email = `${label}-${randomUUID().slice(0, 8)}@people.example`;
  const name = `${label[0].toUpperCase()}${label.slice(1)} Testperson`;
  const response = await fetch(`${baseUrl}/api/account/sign-up`, {
    method: "POST",
    headers: { "content-type": "application/json", ...originHeader(baseUrl) },
    body: JSON.stringify({ name, email, password: NEW_PASSWORD }),
  });
  if (response.status !== 201) throw new Error(`sign-up answered ${response.status}: ${await response.text()}`);
  const { user } = await response.json();
  const signedIn = await signInWithPassword(baseUrl, email, NEW_PASSWORD);
  if (!signedIn.ok) throw new Error(`sign-in after sign-up failed: ${signedIn.error}`);
  return { email, name, id: user.id, session: signedIn.session };
}

interface Captured {
  to: string[];
  subject: string;
  text: string;
}

/** The newest captured mail to `to` from /api/dev/mail (the running app's view of the mail fake's folder). */
export async function mailTo(baseUrl: string, to: string, subject?: RegExp, timeoutMs = 5_000): Promise<Captured> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const { mail } = (await (await fetch(`${baseUrl}/api/dev/mail`)).json()) as { mail: Captured[] };
    const found = mail.find((m) => m.to.includes(to) && (!subject || subject.test(m.subject)));
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no mail to ${to}`);
}

/** Owner invites `person` with `role`; the person accepts through the API with the mailed token. */
export async function inviteAndAccept(baseUrl: string, owner: TestPerson, workspaceId: string, person: TestPerson, role: string) {
  const sent = await owner.session.fetch(`/api/workspaces/${workspaceId}/invitations`, { method: "POST", body: { email: person.email, role } });
  if (sent.status !== 201) throw new Error(`invite answered ${sent.status}: ${await sent.text()}`);
  const mail = await mailTo(baseUrl, person.email, /invites you/);
  const token = linkIn(mail.text, "/invitations/").split("/invitations/")[1];
  const accepted = await person.session.fetch(`/api/invitations/${token}`, { method: "POST" });
  if (accepted.status !== 200) throw new Error(`accept answered ${accepted.status}: ${await accepted.text()}`);
  return token;
}
