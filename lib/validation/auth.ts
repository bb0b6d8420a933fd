import { z } from "zod";

export const signInSchema = z.object({
  email: z.string({ error: "E-mail is required" }).trim().min(1, { error: "E-mail is required" }).max(254),
  password: z.string({ error: "Password is required" }).min(1, { error: "Password is required" }).max(200),
});

export const signUpSchema = z.object({
  name: z.string({ error: "Name is required" }).trim().min(1, { error: "Name is required" }).max(120),
  email: z.email({ error: "Enter a valid e-mail address" }).trim().max(254),
  password: z.string({ error: "Password is required" }).min(10, { error: "Use at least 10 characters" }).max(200),
});
