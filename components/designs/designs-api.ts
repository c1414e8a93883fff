"use client";

import { ApiError } from "@/components/api/client";

/** An API error that keeps the server's `detail` (a 409 names the head revision, who saved it and when). */
export class DesignApiError extends ApiError {
  readonly detail?: unknown;
  constructor(status: number, code: string, message: string, fields?: Record<string, string>, detail?: unknown) {
    super(status, code, message, fields);
    this.detail = detail;
  }
}

/** JSON to and from the designs API; errors become DesignApiError with the server's message. */
export async function designsFetch<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, {
      method: init.method ?? "GET",
      headers: init.body === undefined ? undefined : { "Content-Type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      credentials: "same-origin",
    });
  } catch {
    throw new DesignApiError(0, "network", "Backplate's server cannot be reached. Check the connection and try again.");
  }
  const data = await response.json().catch(() => null);
  if (!response.ok) {
    const error = data?.error;
    throw new DesignApiError(
      response.status,
      error?.code ?? "unavailable",
      error?.message ?? `The server answered ${response.status}. Try again in a moment.`,
      error?.fields,
      error?.detail,
    );
  }
  return data as T;
}

export const designsUrl = (workspaceId: string) => `/api/workspaces/${workspaceId}/designs`;
export const designUrl = (workspaceId: string, designId: string) => `${designsUrl(workspaceId)}/${designId}`;
