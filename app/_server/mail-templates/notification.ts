import "server-only";
import { mailBodies } from "./layout";

/** The e-mail copy of an inbox notification: its title, its text and one link to the page it is about. */
export function notificationMail(options: { title: string; body: string; url: string }) {
  return {
    subject: options.title,
    ...mailBodies({
      heading: options.title,
      lines: options.body ? options.body.split(/\n+/) : [],
      action: { label: "Open in Backplate", url: options.url },
      footer: "You get this because you are part of this review. Choose which mail you get on your account page.",
    }),
  };
}
