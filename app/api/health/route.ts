import { checkDatabase } from "@/db/health";

export const dynamic = "force-dynamic";

/** 200 with the database round-trip time when PostgreSQL answers; 503 with a readable reason when it does not. */
export async function GET() {
  const database = await checkDatabase();
  if (database.ok) {
    return Response.json({ status: "ok", database: { ok: true, roundTripMs: database.roundTripMs } });
  }
  return Response.json(
    { status: "unavailable", database: { ok: false, message: database.message } },
    { status: 503, headers: { "Retry-After": "5" } },
  );
}
