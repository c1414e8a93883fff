"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { apiFetch } from "@/components/api/client";
import {
  MIN_PASSWORD_LENGTH,
  type PasswordResetCompleteInput,
  passwordResetCompleteSchema,
  type PasswordResetRequestInput,
  passwordResetRequestSchema,
} from "@/components/schemas/account";
import { primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

export function ResetRequestForm() {
  const { register, handleSubmit, formState } = useForm<PasswordResetRequestInput>({
    resolver: zodResolver(passwordResetRequestSchema),
  });
  const request = useMutation({
    mutationFn: (input: PasswordResetRequestInput) =>
      apiFetch<{ message: string }>("/api/account/password-reset", { method: "POST", body: input }),
  });
  return (
    <form onSubmit={handleSubmit((v) => request.mutate(v))} noValidate className="flex flex-col gap-4" aria-label="Ask for a reset link">
      {request.isError ? <Notice tone="error">{request.error.message}</Notice> : null}
      {request.isSuccess ? <Notice tone="done">{request.data.message}</Notice> : null}
      <Field id="reset-email" label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <div>
        <button type="submit" className={primaryButton} disabled={request.isPending}>
          {request.isPending ? "Sending…" : "E-mail me a reset link"}
        </button>
      </div>
    </form>
  );
}

export function ResetCompleteForm({ token }: { token: string }) {
  const router = useRouter();
  const { register, handleSubmit, formState } = useForm<PasswordResetCompleteInput>({
    resolver: zodResolver(passwordResetCompleteSchema),
    defaultValues: { token },
  });
  const complete = useMutation({
    mutationFn: (input: PasswordResetCompleteInput) => apiFetch("/api/account/password-reset", { method: "PUT", body: input }),
    onSuccess: () => router.push("/sign-in?reset=1"),
  });
  return (
    <form onSubmit={handleSubmit((v) => complete.mutate(v))} noValidate className="flex flex-col gap-4" aria-label="Choose a new password">
      {complete.isError ? <Notice tone="error">{complete.error.message}</Notice> : null}
      <input type="hidden" {...register("token")} />
      <Field
        id="reset-password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={formState.errors.password?.message ?? formState.errors.token?.message}
        {...register("password")}
      />
      <div>
        <button type="submit" className={primaryButton} disabled={complete.isPending}>
          {complete.isPending ? "Saving…" : "Set the new password"}
        </button>
      </div>
    </form>
  );
}
