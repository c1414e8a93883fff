import { checkPassword, hashPassword } from "@/app/_server/passwords";
import { readJson, route } from "@/app/_server/respond";
import { requireUser } from "@/app/_server/session";
import { accountUpdateSchema } from "@/components/schemas/account";
import { AppError } from "@/db/errors";
import { getUserById, updateUserName, updateUserPasswordHash } from "@/db/users";

/** The signed-in person's own account. */
export const GET = route(async () => {
  const user = await requireUser();
  return Response.json({ user });
});

/** Changes the name and/or the password (the current password is checked first; nothing changes if it is wrong). */
export const PATCH = route(async (request: Request) => {
  const { id } = await requireUser();
  const input = await readJson(request, accountUpdateSchema);
  if (input.newPassword !== undefined) {
    const row = await getUserById(id);
    if (!(await checkPassword(input.currentPassword ?? "", row?.passwordHash ?? null))) {
      const message = row?.passwordHash
        ? "That is not your current password."
        : "This account has no password yet: reset it by e-mail to set one.";
      throw new AppError("invalid_input", message, { fields: { currentPassword: message } });
    }
  }
  if (input.name !== undefined) await updateUserName(id, input.name);
  if (input.newPassword !== undefined) await updateUserPasswordHash(id, await hashPassword(input.newPassword));
  const user = await getUserById(id);
  return Response.json({ user: { id, email: user?.email, name: user?.name } });
});
