import { limitSignUp } from "@/app/_server/account-limits";
import { hashPassword } from "@/app/_server/passwords";
import { readJson, route } from "@/app/_server/respond";
import { signUpSchema } from "@/components/schemas/account";
import { createUserWithPassword } from "@/db/users";

/** Creates an account with a password; the client then signs in through next-auth's password provider. */
export const POST = route(async (request: Request) => {
  await limitSignUp(request);
  const input = await readJson(request, signUpSchema);
  const user = await createUserWithPassword({
    name: input.name,
    email: input.email,
    passwordHash: await hashPassword(input.password),
  });
  return Response.json({ user: { id: user.id, email: user.email, name: user.name } }, { status: 201 });
});
