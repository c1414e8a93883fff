/**
 * Next.js calls register() once when a server process starts: the notification mailer's retry loop runs from then
 * on, so mail refused while the mail server was down goes out when it is back, without anyone saving again.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { startNotificationMailer } = await import("./app/_server/notification-mailer");
    startNotificationMailer();
  }
}
