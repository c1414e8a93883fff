/**
 * The one error type of the server side. Query functions, server actions and route handlers throw it; the route
 * wrapper (app/_server/respond.ts) and the actions turn it into an HTTP status and a JSON body
 * `{ "error": { "code", "message", "fields"?, "detail"? } }` whose message says what to do.
 */
export type AppErrorCode =
  | "bad_request"
  | "invalid_input"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "gone"
  | "payload_too_large"
  | "unsupported_media_type"
  | "rate_limited"
  | "unavailable";

const STATUS: Record<AppErrorCode, number> = {
  bad_request: 400,
  invalid_input: 422,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
};

export interface AppErrorBody {
  code: AppErrorCode;
  message: string;
  /** field path → message, for forms */
  fields?: Record<string, string>;
  /** anything a client needs to recover (e.g. who saved first on a 409) */
  detail?: unknown;
}

export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly fields?: Record<string, string>;
  readonly detail?: unknown;

  constructor(code: AppErrorCode, message: string, extra: { fields?: Record<string, string>; detail?: unknown } = {}) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fields = extra.fields;
    this.detail = extra.detail;
  }

  get status(): number {
    return STATUS[this.code];
  }

  toBody(): AppErrorBody {
    const body: AppErrorBody = { code: this.code, message: this.message };
    if (this.fields) body.fields = this.fields;
    if (this.detail !== undefined) body.detail = this.detail;
    return body;
  }
}

export function isAppError(error: unknown): error is AppError {
  return error instanceof AppError;
}
