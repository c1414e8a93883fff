import "server-only";
import { ZodError, type ZodType } from "zod";
import { AppError } from "@/db/errors";

/** Largest JSON body a route accepts unless it says otherwise (a circuit file is far smaller). */
export const DEFAULT_BODY_LIMIT_BYTES = 1_000_000;

/** Turns a zod failure into field messages a form can show beside each input. */
export function zodFields(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Messages of node-postgres when the server cannot be reached or went away mid-query. */
// pg's own phrases too: a pooled client whose connection broke mid-query is "not queryable" until replaced.
const UNREACHABLE_MESSAGE =
  /ECONNREFUSED|ECONNRESET|EPIPE|Connection terminated|connect ETIMEDOUT|timeout exceeded when trying to connect|not queryable/i;
/** SQLSTATEs of a server shutting down or starting up (57P01–57P03) and of a broken connection (class 08). */
const UNREACHABLE_SQLSTATE = /^(57P0[123]|08\d{3})$/;

/**
 * Whether an error means PostgreSQL is down or restarting. Drizzle wraps the driver's error in one of its own
 * ("Failed query: …") with the original as `cause`, so the whole cause chain is looked at.
 */
function databaseUnreachable(error: unknown): boolean {
  for (let e: unknown = error, depth = 0; e && depth < 5; e = (e as { cause?: unknown }).cause, depth += 1) {
    const { message, code } = e as { message?: unknown; code?: unknown };
    if (typeof message === "string" && UNREACHABLE_MESSAGE.test(message)) return true;
    if (typeof code === "string" && (UNREACHABLE_SQLSTATE.test(code) || /^(ECONNREFUSED|ECONNRESET|EPIPE)$/.test(code))) return true;
    // Node's connect to a host with several addresses fails with an AggregateError of the attempts.
    if (e instanceof AggregateError && e.errors.some((inner) => databaseUnreachable(inner))) return true;
  }
  return false;
}

export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) {
    const fields = zodFields(error);
    const first = Object.entries(fields)[0];
    return new AppError("invalid_input", first ? `${first[0]}: ${first[1]}` : "The input is not valid.", { fields });
  }
  if (databaseUnreachable(error)) return new AppError("unavailable", "The database is not answering. Try again in a moment.");
  console.error(error);
  return new AppError("unavailable", "Something went wrong on the server. Try again; if it persists, tell an owner.");
}

export function errorResponse(error: unknown): Response {
  const appError = toAppError(error);
  const headers: Record<string, string> = {};
  if (appError.code === "unavailable") headers["Retry-After"] = "5";
  return Response.json({ error: appError.toBody() }, { status: appError.status, headers });
}

/** Reads and validates a JSON body: size-limited, malformed JSON and wrong shapes become 4xx with a message. */
export async function readJson<T>(request: Request, schema: ZodType<T>, limitBytes = DEFAULT_BODY_LIMIT_BYTES): Promise<T> {
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > limitBytes) {
    throw new AppError("payload_too_large", `The request body is larger than ${Math.round(limitBytes / 1000)} kB.`);
  }
  const text = await request.text();
  if (Buffer.byteLength(text) > limitBytes) {
    throw new AppError("payload_too_large", `The request body is larger than ${Math.round(limitBytes / 1000)} kB.`);
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
  return schema.parse(data);
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler so every thrown error becomes the one error response shape. */
export function route<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}
