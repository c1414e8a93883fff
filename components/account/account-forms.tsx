"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useSession } from "next-auth/react";
import { useForm } from "react-hook-form";
import { ApiError, apiFetch } from "@/components/api/client";
import { type AccountUpdateInput, accountUpdateSchema, MIN_PASSWORD_LENGTH } from "@/components/schemas/account";
import { primaryButton } from "@/components/ui/buttons";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

function useAccountUpdate(onFields: (fields: Record<string, string>) => void) {
  return useMutation({
    mutationFn: (input: AccountUpdateInput) => apiFetch("/api/account", { method: "PATCH", body: input }),
    onError: (error) => {
      if (error instanceof ApiError && error.fields) onFields(error.fields);
    },
  });
}

export function NameForm({ name }: { name: string }) {
  const session = useSession();
  const { register, handleSubmit, formState, setError } = useForm<AccountUpdateInput>({
    resolver: zodResolver(accountUpdateSchema),
    defaultValues: { name },
  });
  const save = useAccountUpdate((fields) => fields.name && setError("name", { message: fields.name }));
  return (
    <form
      onSubmit={handleSubmit(async (v) => {
        await save.mutateAsync({ name: v.name }).catch(() => {});
        // The session cookie carries the name the header shows; update() refreshes it from the database.
        await session.update();
      })}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Name"
    >
      {save.isError && !(save.error instanceof ApiError && save.error.fields) ? <Notice tone="error">{save.error.message}</Notice> : null}
      {save.isSuccess ? <Notice tone="done">Name saved.</Notice> : null}
      <Field id="account-name" label="Name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <div>
        <button type="submit" className={primaryButton} disabled={save.isPending}>
          Save name
        </button>
      </div>
    </form>
  );
}

export function PasswordForm() {
  const { register, handleSubmit, formState, setError, reset } = useForm<AccountUpdateInput>({
    resolver: zodResolver(accountUpdateSchema),
  });
  const save = useAccountUpdate((fields) => {
    for (const [key, message] of Object.entries(fields)) setError(key as keyof AccountUpdateInput, { message });
  });
  return (
    <form
      onSubmit={handleSubmit((v) =>
        save.mutate({ currentPassword: v.currentPassword, newPassword: v.newPassword }, { onSuccess: () => reset({}) }),
      )}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Password"
    >
      {save.isError && !(save.error instanceof ApiError && save.error.fields) ? <Notice tone="error">{save.error.message}</Notice> : null}
      {save.isSuccess ? <Notice tone="done">Password changed.</Notice> : null}
      <Field
        id="account-current-password"
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.currentPassword?.message}
        {...register("currentPassword")}
      />
      <Field
        id="account-new-password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={formState.errors.newPassword?.message ?? formState.errors.name?.message}
        {...register("newPassword")}
      />
      <div>
        <button type="submit" className={primaryButton} disabled={save.isPending}>
          Change password
        </button>
      </div>
    </form>
  );
}
