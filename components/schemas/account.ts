/**
 * Inputs of sign-up, sign-in, password reset and account settings. One schema per input, shared by the form (through
 * react-hook-form's zod resolver), the route handler and next-auth's authorize().
 */
import { z } from "zod";

/** The shortest password Backplate accepts (pinned decision: at least 10 characters). */
export const MIN_PASSWORD_LENGTH = 10;
/** bcrypt works on the first 72 bytes only; longer passwords would be silently truncated. */
export const MAX_PASSWORD_BYTES = 72;

export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is longer than 254 characters.")
  .pipe(z.email({ error: "Enter an e-mail address like name@example.com." }))
  .transform((value) => value.toLowerCase());

export const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`)
  .refine((value) => new TextEncoder().encode(value).length <= MAX_PASSWORD_BYTES, {
    message: `Use at most ${MAX_PASSWORD_BYTES} bytes (about ${MAX_PASSWORD_BYTES} plain letters).`,
  });

export const nameField = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(120, "Keep the name under 120 characters.");

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password."),
});
export type SignInInput = z.input<typeof signInSchema>;

export const emailLinkSchema = z.object({ email: emailField });
export type EmailLinkInput = z.input<typeof emailLinkSchema>;

export const signUpSchema = z.object({
  name: nameField,
  email: emailField,
  password: newPasswordField,
});
export type SignUpInput = z.input<typeof signUpSchema>;

export const passwordResetRequestSchema = z.object({ email: emailField });
export type PasswordResetRequestInput = z.input<typeof passwordResetRequestSchema>;

export const tokenField = z
  .string({ error: "The link has no token." })
  .regex(/^[A-Za-z0-9_-]{43}$/, "This link is not complete. Open it again from the e-mail, or ask for a new one.");

export const passwordResetCompleteSchema = z.object({
  token: tokenField,
  password: newPasswordField,
});
export type PasswordResetCompleteInput = z.input<typeof passwordResetCompleteSchema>;

/** Account settings: a new name, a new password (with the current one), or both. */
export const accountUpdateSchema = z
  .object({
    name: nameField.optional(),
    currentPassword: z.string().optional(),
    newPassword: newPasswordField.optional(),
  })
  .refine((value) => value.name !== undefined || value.newPassword !== undefined, {
    message: "Change the name or the password.",
    path: ["name"],
  })
  .refine((value) => value.newPassword === undefined || (value.currentPassword ?? "").length > 0, {
    message: "Enter your current password to set a new one.",
    path: ["currentPassword"],
  });
export type AccountUpdateInput = z.input<typeof accountUpdateSchema>;
