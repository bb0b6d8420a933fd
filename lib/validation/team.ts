import { z } from "zod";
import { ROLES } from "@/models/roles";
import { signUpSchema } from "./auth";

const role = z.enum(ROLES, { error: "Choose a role: designer, electrician, stage manager or viewer" });
const email = z
  .email({ error: "Enter a valid e-mail address" })
  .trim()
  .max(254, { error: "An e-mail address is at most 254 characters" });
const token = z
  .string({ error: "The link's token is missing" })
  .regex(/^[A-Za-z0-9_-]{43}$/, { error: "That link is not valid" });

export const inviteSchema = z.strictObject({ email, role });
export const changeRoleSchema = z.strictObject({
  role,
  version: z.coerce
    .number({ error: "version must be the number you last saw" })
    .int({ error: "version must be a whole number" })
    .positive({ error: "version must be the number you last saw" }),
});

/** Accepting as a new account: the invited address is the account's, so only a name and a password are asked. */
export const acceptNewAccountSchema = z.strictObject({
  token,
  name: signUpSchema.shape.name,
  password: signUpSchema.shape.password,
});
export const acceptSignedInSchema = z.strictObject({ token });
export const acceptSchema = z.strictObject({
  token,
  name: signUpSchema.shape.name.optional(),
  password: signUpSchema.shape.password.optional(),
});

export const resetRequestSchema = z.strictObject({ email });
export const resetConfirmSchema = z.strictObject({ token, password: signUpSchema.shape.password });
