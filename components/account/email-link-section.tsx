"use client";

import { useState } from "react";
import { secondaryButton } from "@/components/ui/buttons";
import { EmailLinkForm } from "./email-link-form";

/**
 * The sign-in link form opens on request, so the page has one e-mail field at first (the password form's) and
 * a password manager or a screen reader meets one obvious sign-in form.
 */
export function EmailLinkSection({ callbackUrl, alreadySent }: { callbackUrl?: string; alreadySent?: boolean }) {
  const [open, setOpen] = useState(Boolean(alreadySent));
  if (open) return <EmailLinkForm callbackUrl={callbackUrl} alreadySent={alreadySent} />;
  return (
    <button type="button" className={secondaryButton} onClick={() => setOpen(true)}>
      Use a sign-in link instead
    </button>
  );
}
