import { readJson, route } from "@/app/_server/respond";
import { requireUser } from "@/app/_server/session";
import { notificationPreferencesSchema } from "@/components/schemas/review";
import { getPreferences, setPreferences } from "@/db/notifications";

export const dynamic = "force-dynamic";

/** Which notifications reach the person by e-mail (the inbox always has them). */
export const GET = route(async () => {
  const user = await requireUser();
  return Response.json({ preferences: await getPreferences(user.id) });
});

export const PUT = route(async (request: Request) => {
  const user = await requireUser();
  const input = await readJson(request, notificationPreferencesSchema);
  return Response.json({ preferences: await setPreferences(user.id, input) });
});
