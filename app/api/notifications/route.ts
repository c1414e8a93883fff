import { readJson, route } from "@/app/_server/respond";
import { requireUser } from "@/app/_server/session";
import { markReadSchema } from "@/components/schemas/review";
import { listInbox, markRead, unreadCount } from "@/db/notifications";

export const dynamic = "force-dynamic";

/** The signed-in person's inbox, newest first, with the unread count (?unread=1 for unread only). */
export const GET = route(async (request: Request) => {
  const user = await requireUser();
  const unreadOnly = new URL(request.url).searchParams.get("unread") === "1";
  const [notifications, unread] = await Promise.all([listInbox(user.id, { unreadOnly }), unreadCount(user.id)]);
  return Response.json({ notifications, unread });
});

/** Marks notifications read: { ids: [...] } or { all: true }. */
export const POST = route(async (request: Request) => {
  const user = await requireUser();
  const which = await readJson(request, markReadSchema);
  const marked = await markRead(user.id, which);
  return Response.json({ marked, unread: await unreadCount(user.id) });
});
