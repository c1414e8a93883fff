"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/components/api/client";
import { Notice } from "@/components/ui/notice";

interface CapturedMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  date: string;
}

/** A plain-text body with its links made clickable. */
function Linkified({ text }: { text: string }) {
  const pieces: { key: string; text: string; link: boolean }[] = [];
  let offset = 0;
  for (const part of text.split(/(https?:\/\/\S+)/g)) {
    pieces.push({ key: `${offset}`, text: part, link: /^https?:\/\//.test(part) });
    offset += part.length;
  }
  return (
    <>
      {pieces.map((piece) =>
        piece.link ? (
          <a key={piece.key} href={piece.text} className="break-all text-trace underline">
            {piece.text}
          </a>
        ) : (
          <span key={piece.key}>{piece.text}</span>
        ),
      )}
    </>
  );
}

export function CapturedMailList() {
  const mail = useQuery({
    queryKey: ["dev", "mail"],
    queryFn: async () => (await apiFetch<{ mail: CapturedMail[] }>("/api/dev/mail")).mail,
    refetchInterval: 3_000,
  });
  if (mail.isPending) return <p className="text-ink-soft">Loading captured mail…</p>;
  if (mail.isError) return <Notice tone="error">{mail.error.message}</Notice>;
  if (mail.data.length === 0) return <Notice>No mail yet. Ask for a sign-in link or send an invitation, and it shows here.</Notice>;
  return (
    <ul className="flex flex-col gap-4">
      {mail.data.map((message) => (
        <li key={message.id} className="rounded-lg border border-rule bg-paper p-4" data-testid="captured-mail">
          <p className="font-mono text-xs text-ink-soft">
            {message.date.slice(0, 19).replace("T", " ")} UTC · to {message.to.join(", ")}
          </p>
          <h2 className="mt-1 text-lg font-bold">{message.subject}</h2>
          <pre className="mt-2 whitespace-pre-wrap font-sans text-sm text-ink-soft">
            <Linkified text={message.text} />
          </pre>
        </li>
      ))}
    </ul>
  );
}
