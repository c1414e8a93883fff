"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { type EmailLinkInput, emailLinkSchema } from "@/components/schemas/account";
import { secondaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { safeCallbackPath, signInErrorMessage } from "./sign-in-messages";

/** Asks next-auth's e-mail provider for a one-time sign-in link. Only existing accounts get one. */
export function EmailLinkForm({ callbackUrl, alreadySent }: { callbackUrl?: string; alreadySent?: boolean }) {
  const [failure, setFailure] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(alreadySent ? "your address" : null);
  const { register, handleSubmit, formState } = useForm<EmailLinkInput>({ resolver: zodResolver(emailLinkSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    setSentTo(null);
    const parsed = emailLinkSchema.parse(values);
    const result = await signIn("email", {
      email: parsed.email,
      callbackUrl: safeCallbackPath(callbackUrl),
      redirect: false,
    });
    if (!result || result.error) {
      setFailure(signInErrorMessage(result?.error ?? "EmailSignin"));
      return;
    }
    setSentTo(parsed.email);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      {sentTo ? (
        <Notice tone="done">
          A sign-in link is on its way to {sentTo}. It works once, within 24 hours.
        </Notice>
      ) : null}
      <Field
        id="email-link-email"
        label="E-mail"
        type="email"
        autoComplete="email"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <div>
        <button type="submit" className={secondaryButton} disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Sending…" : "E-mail me a sign-in link"}
        </button>
      </div>
    </form>
  );
}
