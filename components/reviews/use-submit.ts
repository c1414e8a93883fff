"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { ZodType } from "zod";
import { ApiError } from "@/components/api/client";

/**
 * A small form helper for the review forms: validates with the shared zod schema first (field messages at once),
 * sends, shows the server's message on refusal and refreshes the page's server data on success. The typed text
 * stays in the form when anything fails; `clear` takes a refusal away once the person changes what it was about.
 */
export function useSubmit<T>(schema: ZodType<T>, send: (input: T) => Promise<unknown>, onDone?: () => void) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  async function submit(raw: unknown) {
    setError(null);
    const parsed = schema.safeParse(raw);
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) next[issue.path.join(".") || "_"] ??= issue.message;
      setFields(next);
      setError(Object.values(next)[0] ?? "Check the form.");
      return false;
    }
    setFields({});
    setBusy(true);
    try {
      await send(parsed.data);
      onDone?.();
      router.refresh();
      return true;
    } catch (caught) {
      setError(caught instanceof ApiError ? caught.message : "Something went wrong. Try again.");
      if (caught instanceof ApiError && caught.fields) setFields(caught.fields);
      return false;
    } finally {
      setBusy(false);
    }
  }
  function clear() {
    setError(null);
    setFields({});
  }
  return { submit, error, fields, busy, clear };
}
