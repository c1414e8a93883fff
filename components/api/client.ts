/**
 * The browser's side of Backplate's API: JSON in, JSON out, and the server's error shape
 * `{ error: { code, message, fields?, detail? } }` turned into an ApiError a form or a query can show (a 409's
 * `detail` names the head revision, who saved it and when).
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields?: Record<string, string>;
  readonly detail?: unknown;

  constructor(status: number, code: string, message: string, fields?: Record<string, string>, detail?: unknown) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.detail = detail;
  }
}

export async function apiFetch<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, {
      method: init.method ?? "GET",
      headers: init.body === undefined ? undefined : { "Content-Type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "Backplate's server cannot be reached. Check the connection and try again.");
  }
  if (response.status === 204) return undefined as T;
  const data = await response.json().catch(() => null);
  if (!response.ok) {
    const error = data?.error;
    throw new ApiError(
      response.status,
      error?.code ?? "unavailable",
      error?.message ?? `The server answered ${response.status}. Try again in a moment.`,
      error?.fields,
      error?.detail,
    );
  }
  return data as T;
}
