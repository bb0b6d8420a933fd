// One error type for expected failures, with the HTTP status each code maps to. Route handlers turn
// it into JSON; anything else becomes a plain 500 (or 503 when the database is unreachable) with
// nothing internal leaked.
import { z } from "zod";

export type ErrorCode =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "too_large"
  | "unsupported"
  | "too_many_requests"
  | "unavailable"
  | "internal";

const STATUS: Record<ErrorCode, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported: 415,
  too_many_requests: 429,
  unavailable: 503,
  internal: 500,
};

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details: { fieldErrors?: FieldErrors; current?: unknown; retryAfterSeconds?: number } = {},
  ) {
    super(message);
    this.name = "AppError";
  }

  get status() {
    return STATUS[this.code];
  }

  toJSON() {
    return { error: { code: this.code, message: this.message, ...this.details } };
  }
}

export const notFound = (what = "That") => new AppError("not_found", `${what} was not found.`);
export const forbidden = (message = "Your role on this production cannot do that.") => new AppError("forbidden", message);

/** Turns a zod failure into a 400 that names each field. */
export function fromZodError(error: z.ZodError, prefix = ""): AppError {
  const fieldErrors: FieldErrors = {};
  for (const issue of error.issues) {
    const key = prefix + (issue.path.length ? issue.path.join(".") : "(body)");
    (fieldErrors[key] ??= []).push(issue.message);
  }
  const summary = Object.entries(fieldErrors)
    .slice(0, 3)
    .map(([k, v]) => `${k}: ${v[0]}`)
    .join("; ");
  return new AppError("bad_request", `Please check the input — ${summary}`, { fieldErrors });
}

/** True for errors that mean the database cannot be reached (as opposed to a bad query). */
export function isDatabaseDown(err: unknown): boolean {
  const e = err as { name?: string; code?: string; original?: { code?: string }; parent?: { code?: string } };
  const code = e?.original?.code ?? e?.parent?.code ?? e?.code ?? "";
  return (
    e?.name === "SequelizeConnectionError" ||
    e?.name === "SequelizeConnectionRefusedError" ||
    e?.name === "SequelizeHostNotFoundError" ||
    e?.name === "SequelizeConnectionAcquireTimeoutError" ||
    e?.name === "SequelizeConnectionTimedOutError" ||
    ["ECONNREFUSED", "ER_GET_CONNECTION_TIMEOUT", "ER_CONNECTION_TIMEOUT", "ETIMEDOUT", "ER_SOCKET_UNEXPECTED_CLOSE"].includes(code)
  );
}

export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof z.ZodError) return fromZodError(err);
  if (isDatabaseDown(err)) return new AppError("unavailable", "The database is not reachable right now. Try again in a moment.");
  console.error(err);
  return new AppError("internal", "Something went wrong on the server. The error has been logged.");
}
