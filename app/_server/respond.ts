import "server-only";
import { ZodError, type ZodType } from "zod";
import { AppError } from "@/db/errors";

/** Largest JSON body a route accepts unless it says otherwise (a circuit file is far smaller). */
export const DEFAULT_BODY_LIMIT_BYTES = 1_000_000;

type Issue = { path: PropertyKey[]; message: string; code?: string; errors?: Issue[][] };

/** zod's own wording starts so; a schema's author words theirs as advice (components/schemas). */
const isZodDefault = (message: string) => message.startsWith("Invalid input");

/**
 * The issues that name a field. A union's own issue ("Invalid input" at the union's path) names none, so the branch
 * that came closest (the fewest problems) speaks for it: `{ body: 5, anchor }` is about `body`, not the whole body.
 * Among equally close branches, one with the schema's own words wins over zod's defaults: a due date of 5 is told
 * "Give the due date as a day…", not 'expected ""' from the empty-string alternative.
 */
function namedIssues(issue: Issue, prefix: PropertyKey[] = []): { path: PropertyKey[]; message: string }[] {
  const path = [...prefix, ...issue.path];
  if (issue.code === "invalid_union" && issue.errors && issue.errors.length > 0) {
    const fewest = Math.min(...issue.errors.map((branch) => branch.length));
    const closest = issue.errors.filter((branch) => branch.length === fewest);
    const worded = closest.find((branch) => branch.every((inner) => !isZodDefault(inner.message))) ?? closest[0];
    return worded.flatMap((inner) => namedIssues(inner, path));
  }
  return [{ path, message: issue.message }];
}

/** Turns a zod failure into field messages a form can show beside each input ("_": the input as a whole). */
export function zodFields(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues.flatMap((i) => namedIssues(i as Issue))) {
    const key = issue.path.map(String).join(".") || "_";
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
    // the field's name leads the message, so an API caller knows which one to fix
    const label = first?.[0] === "_" ? "The request body" : first?.[0];
    return new AppError("invalid_input", first ? `${label}: ${first[1]}` : "The input is not valid.", { fields });
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

const mb = (bytes: number) => `${Math.round(bytes / 100_000) / 10} MB`;

function tooLarge(limitBytes: number): AppError {
  return new AppError("payload_too_large", `The request body is larger than ${mb(limitBytes)}, the most this request takes. Send a smaller body.`);
}

/** Reads and validates a JSON body: size-limited, malformed JSON and wrong shapes become 4xx with a message. */
export async function readJson<T>(request: Request, schema: ZodType<T>, limitBytes = DEFAULT_BODY_LIMIT_BYTES): Promise<T> {
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > limitBytes) throw tooLarge(limitBytes);
  const text = await request.text();
  if (Buffer.byteLength(text) > limitBytes) throw tooLarge(limitBytes);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    const why = error instanceof SyntaxError ? ` (${error.message})` : "";
    throw new AppError(
      "bad_request",
      `The request body is not valid JSON${why}. Send one JSON object with Content-Type: application/json.`,
    );
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
