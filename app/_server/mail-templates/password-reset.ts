import "server-only";
import { mailBodies } from "./layout";

export function passwordResetMail(url: string) {
  return {
    subject: "Reset your Backplate password",
    ...mailBodies({
      heading: "Choose a new password",
      lines: ["Someone (we hope you) asked to reset the password of the Backplate account with this address.", "The link works once, within 1 hour."],
      action: { label: "Choose a new password", url },
      footer: "If you did not ask for it, ignore this mail: your password stays as it is.",
    }),
  };
}
