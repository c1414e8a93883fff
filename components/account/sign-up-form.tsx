"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { ApiError, apiFetch } from "@/components/api/client";
import { MIN_PASSWORD_LENGTH, type SignUpInput, signUpSchema } from "@/components/schemas/account";
import { primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { safeCallbackPath } from "./sign-in-messages";

/** Creates the account through the API, then signs in with the same password. */
export function SignUpForm({ callbackUrl, email }: { callbackUrl?: string; email?: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { email: email ?? "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await apiFetch("/api/account/sign-up", { method: "POST", body: values });
    } catch (error) {
      if (error instanceof ApiError && error.fields) {
        for (const [field, message] of Object.entries(error.fields)) setError(field as keyof SignUpInput, { message });
      } else setFailure(error instanceof Error ? error.message : String(error));
      return;
    }
    const result = await signIn("password", { email: values.email, password: values.password, redirect: false });
    if (!result || result.error) {
      setFailure("Your account is made, but signing in failed. Sign in on the sign-in page.");
      return;
    }
    router.push(safeCallbackPath(callbackUrl, "/workspaces"));
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Create an account">
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      <Field id="sign-up-name" label="Name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <Field
        id="sign-up-email"
        label="E-mail"
        type="email"
        autoComplete="email"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <Field
        id="sign-up-password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters. A short sentence works well.`}
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <div>
        <button type="submit" className={primaryButton} disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Creating…" : "Create account"}
        </button>
      </div>
    </form>
  );
}
