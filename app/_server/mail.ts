import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { AppError } from "@/db/errors";

/**
 * Sends Backplate's mail through SMTP_URL: the local fake under `npm start` and the tests, a real server in
 * production. TLS is not forced (`ignoreTLS`) for plain smtp:// addresses, which is what the fake speaks; a real
 * server is reached with smtps:// (implicit TLS) or its own STARTTLS.
 */
export interface Mail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

const globalForMail = globalThis as unknown as { backplateMail?: { url: string; transport: Transporter } };

function transport(): Transporter {
  const url = process.env.SMTP_URL;
  if (!url) throw new AppError("unavailable", "Mail is not set up on this server (SMTP_URL is empty). Tell an owner.");
  if (globalForMail.backplateMail?.url !== url) {
    const plain = url.startsWith("smtp://") && isLocal(url);
    globalForMail.backplateMail = {
      url,
      transport: nodemailer.createTransport(plain ? { url, secure: false, ignoreTLS: true } : url),
    };
  }
  return globalForMail.backplateMail.transport;
}

function isLocal(url: string): boolean {
  const host = new URL(url).hostname;
  return host === "127.0.0.1" || host === "localhost" || host === "::1";
}

export function mailFrom(): string {
  return process.env.MAIL_FROM || "Backplate <bench@backplate.example>";
}

export async function sendMail(mail: Mail): Promise<void> {
  try {
    await transport().sendMail({ from: mailFrom(), ...mail });
  } catch (error) {
    if (error instanceof AppError) throw error;
    console.error(error);
    throw new AppError("unavailable", "The mail server did not take the message. Try again in a minute.");
  }
}

/** The app's public address for links in mail (NEXTAUTH_URL, which the launcher sets). */
export function appUrl(path: string): string {
  const base = (process.env.NEXTAUTH_URL || "http://127.0.0.1:3000").replace(/\/+$/, "");
  return `${base}${path}`;
}
