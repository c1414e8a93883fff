"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { type SignInInput, signInSchema } from "@/components/schemas/account";
import { primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { safeCallbackPath, signInErrorMessage } from "./sign-in-messages";

/** E-mail and password sign-in through next-auth's "password" provider. */
export function PasswordSignInForm({ callbackUrl }: { callbackUrl?: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const target = safeCallbackPath(callbackUrl);
    const result = await signIn("password", { email: values.email, password: values.password, redirect: false });
    if (!result || result.error) {
      setFailure(signInErrorMessage(result?.error ?? "CredentialsSignin"));
      return;
    }
    router.push(target);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      <Field
        id="sign-in-email"
        label="E-mail"
        type="email"
        autoComplete="email"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <Field
        id="sign-in-password"
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <button type="submit" className={primaryButton} disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Signing in…" : "Sign in"}
        </button>
        <Link href="/reset-password" className="text-sm text-brass-deep underline underline-offset-2 hover:text-ink">
          Forgot the password?
        </Link>
      </div>
    </form>
  );
}
