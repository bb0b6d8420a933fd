import { describe, expect, it } from "vitest";
import { signUpExistingAccountMessage, signUpMessage } from "@/lib/mail/sign-up-messages";

// The two answers to a sign-up request, as mailed: a new address gets the finishing link and its expiry;
// an address with an account gets no finishing link, but the sign-in page and a reset link instead.
describe("sign-up mail", () => {
  const expiresAt = new Date("2026-12-06T17:00:00Z");
  it("to a new address: greets by the name typed, gives the link on a line of its own and when it expires", () => {
    const m = signUpMessage({ name: "Nell Quarry", link: "http://host/sign-up/abc", expiresAt });
    expect(m.subject).toBe("Finish creating your Throwline account");
    expect(m.text.startsWith("Hello Nell Quarry,")).toBe(true);
    expect(m.text).toContain("\nhttp://host/sign-up/abc\n");
    expect(m.text).toContain("Sun, 06 Dec 2026 17:00:00 GMT");
    expect(m.text).not.toContain("/reset-password/");
  });
  it("to an address with an account: says so, links sign-in and a reset, and offers no second account", () => {
    const m = signUpExistingAccountMessage({
      signInLink: "http://host/sign-in",
      resetLink: "http://host/reset-password/xyz",
      expiresAt,
    });
    expect(m.subject).toMatch(/tried to create a Throwline account/);
    expect(m.text).toContain("you already have one");
    expect(m.text).toContain("sign in at http://host/sign-in");
    expect(m.text).toContain("\nhttp://host/reset-password/xyz\n");
    expect(m.text).not.toContain("/sign-up/");
    expect(m.text).toMatch(/signs the account out everywhere else/);
  });
});
