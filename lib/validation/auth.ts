/**
 * Schemas for signing in, signing up and account settings. The same objects validate the browser
 * forms (react-hook-form's zod resolver) and the route handlers, so both give the same messages.
 */
import { z } from "zod";
import { describePasswordWeakness, PASSWORD_MIN_LENGTH } from "@/lib/auth/password-policy";

export const EMAIL_MAX_LENGTH = 254; // RFC 5321 limit on a forward path, common practice for address columns
export const NAME_MAX_LENGTH = 120;

// Names are plain text: anything printable, no control characters (they break mail headers and logs).
const CONTROL_CHARACTERS = /[\p{Cc}\p{Cf}]/u;

export const emailSchema = z
  .string({ error: "enter your e-mail address" })
  .trim()
  .min(1, "enter your e-mail address")
  .max(EMAIL_MAX_LENGTH, `an e-mail address has at most ${EMAIL_MAX_LENGTH} characters`)
  .pipe(z.email("enter a valid e-mail address, such as name@firm.com"))
  .transform((email) => email.toLowerCase());

export function plainNameSchema(what: string) {
  return z
    .string({ error: `enter ${what}` })
    .trim()
    .min(1, `enter ${what}`)
    .max(NAME_MAX_LENGTH, `${what} has at most ${NAME_MAX_LENGTH} characters`)
    .refine((s) => !CONTROL_CHARACTERS.test(s), `${what} may not contain control characters`);
}

export const personNameSchema = plainNameSchema("your name");

/** A password field before the strength rules (used where the password already exists). */
export const passwordInputSchema = z
  .string({ error: "enter your password" })
  .min(1, "enter your password")
  .max(200, "a password has at most 200 characters");

export const newPasswordSchema = z
  .string({ error: "choose a password" })
  .min(PASSWORD_MIN_LENGTH, `use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(200, "a password has at most 200 characters");

function checkStrength(password: string, email: string | undefined, name: string | undefined, path: string, ctx: z.RefinementCtx) {
  const weakness = describePasswordWeakness(password, { email, name });
  if (weakness) ctx.addIssue({ code: "custom", path: [path], message: weakness });
}

export const signUpSchema = z
  .object({ name: personNameSchema, email: emailSchema, password: newPasswordSchema })
  .superRefine((v, ctx) => checkStrength(v.password, v.email, v.name, "password", ctx));
export type SignUpInput = z.input<typeof signUpSchema>;

export const signInSchema = z.object({ email: emailSchema, password: passwordInputSchema });
export type SignInInput = z.input<typeof signInSchema>;

export const emailLinkRequestSchema = z.object({
  email: emailSchema,
  callbackUrl: z.string().max(500).optional(),
});
export type EmailLinkRequestInput = z.input<typeof emailLinkRequestSchema>;

export const accountNameSchema = z.object({ name: personNameSchema });
export type AccountNameInput = z.input<typeof accountNameSchema>;

export const passwordChangeSchema = z
  .object({ currentPassword: passwordInputSchema, newPassword: newPasswordSchema })
  .superRefine((v, ctx) => {
    if (v.currentPassword === v.newPassword) {
      ctx.addIssue({ code: "custom", path: ["newPassword"], message: "the new password must differ from the current one" });
      return;
    }
    checkStrength(v.newPassword, undefined, undefined, "newPassword", ctx);
  });
export type PasswordChangeInput = z.input<typeof passwordChangeSchema>;

/**
 * A callback path after sign-in: only same-site absolute paths, so a crafted link cannot send a
 * person to another site after they sign in.
 */
export function safeCallbackPath(value: string | null | undefined, fallback = "/w"): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return fallback;
  return value.slice(0, 500);
}
