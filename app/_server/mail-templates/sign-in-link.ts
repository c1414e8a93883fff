import "server-only";
import { mailBodies } from "./layout";

export function signInLinkMail(url: string) {
  return {
    subject: "Your Backplate sign-in link",
    ...mailBodies({
      heading: "Sign in to Backplate",
      lines: ["Someone (we hope you) asked for a link to sign in to Backplate with this address.", "The link works once, within 24 hours."],
      action: { label: "Sign in", url },
      footer: "If you did not ask for it, ignore this mail: nobody can sign in without the link.",
    }),
  };
}
