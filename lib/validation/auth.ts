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
