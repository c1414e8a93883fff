import { route } from "@/app/_server/respond";
import { requireUser } from "@/app/_server/session";
import { tokenField } from "@/components/schemas/account";
import { acceptInvitation, previewInvitation } from "@/db/invitations";

type Context = { params: Promise<{ token: string }> };

async function tokenFrom(context: Context): Promise<string> {
  return tokenField.parse((await context.params).token);
}

/** Who invites whom to what; open to anyone holding the link (it names no secret beyond itself). */
export const GET = route(async (_request: Request, context: Context) => {
  const token = await tokenFrom(context);
  return Response.json({ invitation: await previewInvitation(token) });
});

/** Accepts as the signed-in person. */
export const POST = route(async (_request: Request, context: Context) => {
  const token = await tokenFrom(context);
  const user = await requireUser();
  return Response.json(await acceptInvitation(token, user));
});
