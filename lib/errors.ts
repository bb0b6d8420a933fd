// One error type for expected failures, with the HTTP status each code maps to. Route handlers turn
// it into JSON; anything else becomes a plain 500 (or 503 with Retry-After when the database cannot serve it) with
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
export const forbidden = (message = "Your role on this production cannot do that.") =>
  new AppError("forbidden", message);

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

type DriverFailure = {
  name?: string;
  code?: string;
  errno?: number;
  fatal?: boolean;
  original?: DriverFailure;
  parent?: DriverFailure;
};

/** The driver's own error under Sequelize's wrapper (or the error itself when it is the driver's). */
function driverError(err: unknown): DriverFailure {
  const e = (err ?? {}) as DriverFailure;
  return e.original ?? e.parent ?? e;
}

// Driver and socket codes that mean the connection itself failed or was lost (not the query).
const CONNECTION_LOST_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "EPIPE",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "ENOTFOUND",
  "EADDRNOTAVAIL",
  "ER_CONNECTION_TIMEOUT",
  "ER_SOCKET_UNEXPECTED_CLOSE",
  "ER_SOCKET",
  "ER_SOCKET_TIMEOUT",
  "ER_CONNECTION_ALREADY_CLOSED",
  "ER_CMD_CONNECTION_CLOSED",
  "ER_CMD_NOT_EXECUTED_DESTROYED",
  "ER_SERVER_SHUTDOWN",
  "ER_CONNECTION_KILLED",
  "PROTOCOL_CONNECTION_LOST",
  "ER_POOL_ALREADY_CLOSED",
  "ER_INITIAL_TIMEOUT_ERROR",
]);
// MariaDB server errors: 1053 shutting down, 1927 connection killed, 1040 too many connections, and
// 1047, which a Galera node answers while it is not part of the cluster's primary component ("WSREP has
// not yet prepared node for application use"): the node is up but may not serve, so it is an outage.
const CONNECTION_LOST_ERRNOS = new Set([1053, 1927, 1040, 1047]);

export type DatabaseTrouble = "busy" | "unreachable" | "refused" | "lock_contention";

/**
 * Classifies a failure that is about the database's availability rather than the request: the pool
 * is busy (every connection in use), the server cannot be reached or the connection was lost, the
 * server refused the app's credentials, or rows stayed locked by other edits (deadlock or lock wait).
 * Null for everything else (a bad query is a bug, not an outage).
 */
export function databaseTrouble(err: unknown): DatabaseTrouble | null {
  const name = (err as DriverFailure)?.name ?? "";
  const driver = driverError(err);
  const code = driver.code ?? (err as DriverFailure)?.code ?? "";
  const errno = driver.errno ?? (err as DriverFailure)?.errno;
  if (name === "SequelizeConnectionAcquireTimeoutError" || code === "ER_GET_CONNECTION_TIMEOUT") return "busy";
  if (
    name === "SequelizeAccessDeniedError" ||
    code === "ER_ACCESS_DENIED_ERROR" ||
    code === "ER_ACCESS_DENIED_NO_PASSWORD_ERROR"
  )
    return "refused";
  if (isDeadlock(err) || isLockWaitTimeout(err)) return "lock_contention";
  if (
    name === "SequelizeConnectionError" ||
    name === "SequelizeConnectionRefusedError" ||
    name === "SequelizeHostNotFoundError" ||
    name === "SequelizeHostNotReachableError" ||
    name === "SequelizeInvalidConnectionError" ||
    name === "SequelizeConnectionTimedOutError" ||
    CONNECTION_LOST_CODES.has(code) ||
    (errno !== undefined && CONNECTION_LOST_ERRNOS.has(errno)) ||
    driver.fatal === true
  ) {
    return "unreachable";
  }
  return null;
}

/** InnoDB chose this transaction as a deadlock victim and rolled it back (1213): safe to run again. */
export function isDeadlock(err: unknown): boolean {
  const driver = driverError(err);
  return driver.errno === 1213 || driver.code === "ER_LOCK_DEADLOCK";
}

/** A row stayed locked by another transaction past the session's lock wait (1205). */
export function isLockWaitTimeout(err: unknown): boolean {
  const driver = driverError(err);
  return driver.errno === 1205 || driver.code === "ER_LOCK_WAIT_TIMEOUT";
}

/** True for errors that mean the database cannot serve the request now (as opposed to a bad query). */
export function isDatabaseDown(err: unknown): boolean {
  return databaseTrouble(err) !== null;
}

// What each kind of trouble tells the user, and how long a client should wait before trying again.
const TROUBLE: Record<DatabaseTrouble, { message: string; retryAfterSeconds: number }> = {
  busy: {
    message: "The server is busy: every database connection is in use. Try again in a moment.",
    retryAfterSeconds: 2,
  },
  unreachable: { message: "The database is not reachable right now. Try again in a moment.", retryAfterSeconds: 5 },
  refused: {
    message: "The database refused the server's sign-in. An administrator needs to check the server's settings.",
    retryAfterSeconds: 30,
  },
  lock_contention: {
    message: "Other edits to the same items were being saved at the same moment. Try again.",
    retryAfterSeconds: 1,
  },
};

export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof z.ZodError) return fromZodError(err);
  const trouble = databaseTrouble(err);
  if (trouble)
    return new AppError("unavailable", TROUBLE[trouble].message, {
      retryAfterSeconds: TROUBLE[trouble].retryAfterSeconds,
    });
  console.error(err);
  return new AppError("internal", "Something went wrong on the server. The error has been logged.");
}
