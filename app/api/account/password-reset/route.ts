import { limitResetCompletion, limitResetRequest } from "@/app/_server/account-limits";
import { appUrl, sendMail } from "@/app/_server/mail";
import { passwordResetMail } from "@/app/_server/mail-templates/password-reset";
import { hashPassword } from "@/app/_server/passwords";
import { readJson, route } from "@/app/_server/respond";
import { recordRightPassword } from "@/app/_server/sign-in-limits";
import { passwordResetCompleteSchema, passwordResetRequestSchema } from "@/components/schemas/account";
import { completePasswordReset, createPasswordReset } from "@/db/password-resets";
import { findUserByEmail } from "@/db/users";

/**
 * Asks for a reset link. The answer is the same whether or not an account uses the address, so the form cannot be
 * used to find out who has an account.
 */
export const POST = route(async (request: Request) => {
  const { email } = await readJson(request, passwordResetRequestSchema);
  await limitResetRequest(request, email);
  const user = await findUserByEmail(email);
  if (user) {
    const token = await createPasswordReset(user.id);
    await sendMail({ to: user.email, ...passwordResetMail(appUrl(`/reset-password/${token}`)) });
  }
  return Response.json(
    { message: `If an account uses ${email}, a reset link is on its way to it. The link works for 1 hour.` },
    { status: 202 },
  );
});

/** Sets the new password with the token from the mail. */
export const PUT = route(async (request: Request) => {
  await limitResetCompletion(request);
  const input = await readJson(request, passwordResetCompleteSchema);
  const { email } = await completePasswordReset(input.token, await hashPassword(input.password));
  // Whoever holds the mailbox proved it: earlier wrong passwords no longer lock the address out.
  await recordRightPassword(email);
  return Response.json({ message: "Your password is changed. Sign in with the new one." });
});
