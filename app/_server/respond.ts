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

export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) {
    const fields = zodFields(error);
    const first = Object.entries(fields)[0];
    return new AppError("invalid_input", first ? `${first[0]}: ${first[1]}` : "The input is not valid.", { fields });
  }
  const message = error instanceof Error ? error.message : String(error);
  if (/ECONNREFUSED|Connection terminated|connect ETIMEDOUT|timeout exceeded when trying to connect/i.test(message)) {
    return new AppError("unavailable", "The database is not answering. Try again in a moment.");
  }
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
