// Ids in URLs, query strings and form fields: one rule for all of them (lib/http/id.ts).
import { describe, expect, it } from "vitest";
import { MAX_ID, plainCountText, toId } from "@/lib/http/id";
import { parseId } from "@/lib/http/respond";
import { AppError } from "@/lib/errors";

describe("toId", () => {
  it("reads plain positive decimal integers", () => {
    expect(toId("1")).toBe(1);
    expect(toId("16")).toBe(16);
    expect(toId("2147483647")).toBe(2147483647); // largest signed 32-bit INT, MariaDB docs ("INT")
  });

  // Every one of these is a number to JavaScript's Number() or to z.coerce.number(), and would have
  // reached the database as some other row's id. Number("0x10") is 16 (ECMA-262, StringToNumber).
  it.each([
    ["0x10", "hexadecimal"],
    ["0o20", "octal"],
    ["0b10000", "binary"],
    ["1e3", "exponent"],
    ["16.0", "decimal point"],
    ["+16", "sign"],
    ["-16", "negative"],
    [" 16", "leading space"],
    ["16 ", "trailing space"],
    ["016", "leading zero"],
    ["0", "zero"],
    ["", "empty"],
    ["Infinity", "infinity"],
    ["١٦", "non-ASCII digits"],
    ["2147483648", "past the largest INT"],
    ["99999999999", "eleven digits"],
  ])("refuses %j (%s)", (raw) => {
    expect(toId(raw)).toBeNull();
  });

  it("refuses what is not text", () => {
    expect(toId(16)).toBeNull();
    expect(toId(undefined)).toBeNull();
    expect(toId(null)).toBeNull();
  });

  it("agrees with a digit-by-digit reference on 20,000 random texts", () => {
    // Independent reference: base-10 value read one digit at a time, no leading zero, 1 ≤ n ≤ MAX_ID.
    const reference = (s: string) => {
      if (!s.length || s[0] === "0" || [...s].some((c) => c < "0" || c > "9")) return null;
      let n = 0;
      for (const c of s) n = n * 10 + (c.charCodeAt(0) - 48);
      return n >= 1 && n <= MAX_ID ? n : null;
    };
    let seed = 12345;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31); // a fixed LCG: the same texts every run
    const alphabet = "0123456789012345678901234567890123456789xXeE+-. ob";
    for (let i = 0; i < 20_000; i++) {
      const len = 1 + (next() % 12);
      let s = "";
      for (let j = 0; j < len; j++) s += alphabet[next() % alphabet.length];
      expect(toId(s), s).toBe(reference(s));
    }
  });
});

describe("parseId", () => {
  it("answers a malformed id as not found, naming the thing", () => {
    for (const raw of ["0x10", "1e3", "abc", "0"]) {
      const err = (() => {
        try {
          parseId(raw, "Focus point");
        } catch (e) {
          return e;
        }
      })();
      expect(err).toBeInstanceOf(AppError);
      expect((err as AppError).status).toBe(404);
      expect((err as AppError).message).toBe("Focus point was not found.");
    }
  });

  it("passes a plain id through", () => {
    expect(parseId("42", "Cue")).toBe(42);
  });
});

describe("plainCountText", () => {
  const version = plainCountText("version is required");

  it("reads a version from a query string or form field", () => {
    expect(version.parse("3")).toBe(3);
  });

  it("refuses other spellings with a message that names what is wanted", () => {
    const r = version.safeParse("0x3");
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].message).toMatch(/^version is required: a whole number above 0/);
    expect(version.safeParse(undefined).error?.issues[0].message).toBe("version is required");
  });
});
