// The If-None-Match rule of the kept JSON answers, against the HTTP standard's wording.
import { describe, expect, it } from "vitest";
import { etagMatches } from "@/lib/http/stamped-json";

describe("If-None-Match", () => {
  const tag = '"abc123"';
  it("matches the tag alone, in a list, weak or as *", () => {
    // RFC 9110 §13.1.2: If-None-Match uses the weak comparison, so W/"abc123" matches "abc123"; "*" matches any.
    expect(etagMatches(tag, tag)).toBe(true);
    expect(etagMatches(`"x", ${tag}`, tag)).toBe(true);
    expect(etagMatches(`W/${tag}`, tag)).toBe(true);
    expect(etagMatches("*", tag)).toBe(true);
  });
  it("does not match another tag, a tag without quotes or no header", () => {
    expect(etagMatches('"abc1234"', tag)).toBe(false);
    expect(etagMatches("abc123", tag)).toBe(false);
    expect(etagMatches(null, tag)).toBe(false);
    expect(etagMatches("", tag)).toBe(false);
  });
});
