/**
 * The local fake SMTP server that `npm start` and the tests run on 127.0.0.1. It accepts every message (no TLS, no
 * login) and keeps each one in a folder as <id>.eml (the raw message) and <id>.json (to, subject, text, html, date),
 * which the captured-mail page (/dev/mail) and the tests read. Production points SMTP_URL at a real server instead.
 */
import fs from "node:fs";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { parseMail } from "./mime-lite";

/** Largest message the fake keeps (a sign-in mail is a few kB). */
const MAX_MESSAGE_BYTES = 5_000_000;

export interface MailFake {
  port: number;
  dir: string;
  stop(): Promise<void>;
}

export async function startMailFake(options: { port: number; dir: string }): Promise<MailFake> {
  fs.mkdirSync(options.dir, { recursive: true });
  let sequence = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("end", () => {
        try {
          const raw = Buffer.concat(chunks).toString("utf8");
          const receivedAt = new Date();
          // Sortable names: time first, then a counter for messages in the same millisecond.
          const id = `${receivedAt.getTime()}-${String(++sequence).padStart(4, "0")}`;
          const to = session.envelope.rcptTo.map((r) => r.address);
          fs.writeFileSync(path.join(options.dir, `${id}.eml`), raw);
          fs.writeFileSync(path.join(options.dir, `${id}.json`), JSON.stringify({ id, ...parseMail(raw, to, receivedAt) }, null, 2));
          callback();
        } catch (error) {
          callback(error instanceof Error ? error : new Error(String(error)));
        }
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, "127.0.0.1", () => resolve());
  });
  server.on("error", () => {});
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    dir: options.dir,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
