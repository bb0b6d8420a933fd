import { describe, expect, it } from "vitest";
import { invitationMessage, noAccountMessage, passwordResetMessage } from "@/lib/mail/messages";

// The words of the account mail: the link, the role in words, the expiry; the no-account mail carries no link to a reset.
describe("account and team mail", () => {
  const expiresAt = new Date("2026-12-12T15:00:00Z");
  it("an invitation names the production, the role in words, the inviter, the link and when it expires", () => {
    const m = invitationMessage({
      productionName: "Tide Mill",
      role: "stage_manager",
      inviterName: "Oona Vell",
      link: "http://host/invite/abc",
      expiresAt,
    });
    expect(m.subject).toBe("You are invited to Tide Mill on Throwline");
    expect(m.text).toContain("Oona Vell invites you");
    expect(m.text).toContain("as stage manager");
    expect(m.text).toContain("\nhttp://host/invite/abc\n");
    expect(m.text).toContain("Sat, 12 Dec 2026 15:00:00 GMT");
  });
  it("a reset mail has the link and says other sessions end; the no-account mail has no reset link", () => {
    expect(passwordResetMessage({ link: "http://host/reset-password/xyz", expiresAt }).text).toMatch(
      /http:\/\/host\/reset-password\/xyz[\s\S]*signs this account out everywhere else/,
    );
    expect(noAccountMessage({ signUpHint: "Start one." }).text).not.toContain("/reset-password/");
  });
});
