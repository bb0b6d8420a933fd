import { describe, expect, it } from "vitest";
import * as mariadb from "mariadb";
import {
  AccessDeniedError,
  ConnectionAcquireTimeoutError,
  ConnectionRefusedError,
  DatabaseError,
  HostNotReachableError,
  InvalidConnectionError,
  UniqueConstraintError,
} from "sequelize";
import { databaseTrouble, isDeadlock, isLockWaitTimeout, toAppError } from "@/lib/errors";
import { retryOnDeadlock } from "@/lib/data/transaction";

// The driver's own error class with the server's error numbers, wrapped the way Sequelize wraps a
// failed query, so the classification sees what production sees.
const SqlError = (
  mariadb as unknown as {
    SqlError: new (
      msg: string,
      sql: string | null,
      fatal: boolean,
      info: null,
      state: string,
      errno: number,
    ) => Error & { code: string };
  }
).SqlError;
const serverError = (errno: number, state: string, fatal = false) =>
  new SqlError("server said no", "UPDATE fixtures SET colour = ?", fatal, null, state, errno);
const queryFailure = (errno: number, state: string, fatal = false) =>
  new DatabaseError(serverError(errno, state, fatal) as never);

describe("database failures become 503 with a true message and Retry-After, never 500", () => {
  it("the driver maps the server's numbers to the codes the classification names", () => {
    // MariaDB server error reference: 1213 ER_LOCK_DEADLOCK, 1205 ER_LOCK_WAIT_TIMEOUT.
    expect(serverError(1213, "40001").code).toBe("ER_LOCK_DEADLOCK");
    expect(serverError(1205, "HY000").code).toBe("ER_LOCK_WAIT_TIMEOUT");
  });

  it("a deadlock victim (1213) and a lock wait timeout (1205) are lock contention: 503, retry after a second", () => {
    const deadlock = queryFailure(1213, "40001");
    const lockWait = queryFailure(1205, "HY000");
    expect(isDeadlock(deadlock)).toBe(true);
    expect(isLockWaitTimeout(lockWait)).toBe(true);
    for (const err of [deadlock, lockWait]) {
      expect(databaseTrouble(err)).toBe("lock_contention");
      const app = toAppError(err);
      expect(app.status).toBe(503);
      expect(app.details.retryAfterSeconds).toBe(1);
      expect(app.message).toMatch(/same items/);
      expect(app.message).not.toMatch(/UPDATE|fixtures|1213|1205/);
    }
  });

  it("a busy pool says busy, not unreachable", () => {
    const app = toAppError(new ConnectionAcquireTimeoutError(new Error("Operation timeout")));
    expect(app.status).toBe(503);
    expect(app.message).toMatch(/busy/);
    expect(app.message).not.toMatch(/not reachable/);
    expect(app.details.retryAfterSeconds).toBeGreaterThan(0);
  });

  it("refused credentials say so; unreachable, invalid and lost connections say not reachable", () => {
    const refused = toAppError(new AccessDeniedError(serverError(1045, "28000", true) as never));
    expect(refused.status).toBe(503);
    expect(refused.message).toMatch(/refused the server's sign-in/);
    for (const err of [
      new ConnectionRefusedError(Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" }) as never),
      new HostNotReachableError(Object.assign(new Error("EHOSTUNREACH"), { code: "EHOSTUNREACH" }) as never),
      new InvalidConnectionError(Object.assign(new Error("EINVAL"), { code: "EINVAL" }) as never),
      // The server going away under a query: the driver's socket-closed error (45009), fatal.
      queryFailure(45009, "08S01", true),
      // 1053: the server is shutting down; 1927: the connection was killed.
      queryFailure(1053, "08S01"),
      queryFailure(1927, "70100"),
      // 1047 with SQLSTATE 08S01: a Galera node outside the primary component ("WSREP has not yet
      // prepared node for application use", MariaDB Galera documentation).
      queryFailure(1047, "08S01"),
    ]) {
      const app = toAppError(err);
      expect(databaseTrouble(err)).toBe("unreachable");
      expect(app.status).toBe(503);
      expect(app.message).toMatch(/not reachable/);
      expect(app.details.retryAfterSeconds).toBeGreaterThan(0);
    }
  });

  it("a bad query stays a 500 (a bug is not an outage), and a duplicate is not a database outage", () => {
    const original = console.error;
    console.error = () => {};
    try {
      // 1064: syntax error; not fatal, not a connection code.
      expect(databaseTrouble(queryFailure(1064, "42000"))).toBeNull();
      expect(toAppError(queryFailure(1064, "42000")).status).toBe(500);
      expect(databaseTrouble(new UniqueConstraintError({}))).toBeNull();
    } finally {
      console.error = original;
    }
  });
});

describe("a deadlocked transaction runs again a bounded number of times", () => {
  it("succeeds when a later attempt gets through", async () => {
    let calls = 0;
    const result = await retryOnDeadlock(async () => {
      calls++;
      if (calls < 3) throw queryFailure(1213, "40001");
      return "saved";
    });
    expect(result).toBe("saved");
    expect(calls).toBe(3);
  });

  it("gives up after the last attempt with the deadlock (which the route answers 503)", async () => {
    let calls = 0;
    const err = await retryOnDeadlock(async () => {
      calls++;
      throw queryFailure(1213, "40001");
    }, 3).catch((e) => e);
    expect(calls).toBe(3);
    expect(isDeadlock(err)).toBe(true);
    expect(toAppError(err).status).toBe(503);
  });

  it("never repeats other failures (a conflict or a lock wait is answered at once)", async () => {
    for (const failure of [queryFailure(1205, "HY000"), new Error("conflict")]) {
      let calls = 0;
      await retryOnDeadlock(async () => {
        calls++;
        throw failure;
      }).catch(() => {});
      expect(calls).toBe(1);
    }
  });
});
