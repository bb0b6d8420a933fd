import { z } from "zod";

// bcrypt reads at most 72 bytes of a password and ignores the rest; a longer one would not be checked in
// full, so sign-up refuses it with its own message rather than silently shortening it.
export const PASSWORD_MAX_BYTES = 72;
const utf8Bytes = (s: string) => new TextEncoder().encode(s).length;

export const signInSchema = z.object({
  email: z
    .string({ error: "E-mail is required" })
    .trim()
    .min(1, { error: "E-mail is required" })
    .max(254, { error: "An e-mail address is at most 254 characters" }),
  password: z
    .string({ error: "Password is required" })
    .min(1, { error: "Password is required" })
    .max(200, { error: `That is longer than any Throwline password (at most ${PASSWORD_MAX_BYTES} characters)` }),
});

/** The fields of a new account (the finishing form and an invitation accepted as a new account use them). */
export const signUpSchema = z.object({
  name: z
    .string({ error: "Name is required" })
    .trim()
    .min(1, { error: "Name is required" })
    .max(120, { error: "Use at most 120 characters for the name" }),
  email: z
    .email({ error: "Enter a valid e-mail address" })
    .trim()
    .max(254, { error: "An e-mail address is at most 254 characters" }),
  password: z
    .string({ error: "Password is required" })
    .min(10, { error: "Use at least 10 characters" })
    .refine((p) => utf8Bytes(p) <= PASSWORD_MAX_BYTES, {
      error: `Use at most ${PASSWORD_MAX_BYTES} characters (accented letters and symbols count as two or more)`,
    }),
});

/** A token as it appears in a mailed link (43 base64url characters); anything else is refused unread. */
export const linkTokenSchema = z
  .string({ error: "The link's token is missing" })
  .regex(/^[A-Za-z0-9_-]{43}$/, { error: "That link is not valid" });

/** Asking to sign up: a name and an address. The password is chosen from the mailed link. */
export const signUpRequestSchema = z.strictObject({
  name: signUpSchema.shape.name,
  email: signUpSchema.shape.email,
});

/** Finishing a sign-up from its link: the address is the link's, so only a name and a password. */
export const finishSignUpSchema = z.strictObject({
  token: linkTokenSchema,
  name: signUpSchema.shape.name,
  password: signUpSchema.shape.password,
});

/** Joining a production that invited the signed-in account's address. */
export const joinInvitationSchema = z.strictObject({
  invitationId: z.coerce
    .number({ error: "Choose an invitation" })
    .int({ error: "Choose an invitation" })
    .positive({ error: "Choose an invitation" }),
});
