// Password reset by e-mailed link: the same answer for known and unknown addresses (both get a mail), the
// link works once, ends every other session of the account, and an altered link changes nothing.
import { describe, expect, it } from "vitest";
import { linkIn, waitForMail } from "@/tests/support/outbox";
import { ApiSession, freshUser, uniqueEmail } from "./support/api";

describe("password reset", () => {
  it("answers the same for an unknown address, and mails it too", async () => {
    const { email: known } = await freshUser("reset-known", { password: "the-first-password" });
    const unknown = uniqueEmail("reset-unknown");
    const a = await new ApiSession().post("/api/auth/password-reset", { email: known });
    const b = await new ApiSession().post("/api/auth/password-reset", { email: unknown });
    expect([a.status, b.status]).toEqual([202, 202]);
    expect(a.json).toEqual(b.json);
    const toUnknown = await waitForMail(unknown);
    expect(toUnknown.text).not.toMatch(/\/reset-password\/[A-Za-z0-9_-]{43}/);
    expect(linkIn(await waitForMail(known, 2), "/reset-password/").pathname).toMatch(
      /^\/reset-password\/[A-Za-z0-9_-]{43}$/,
    );
  }, 60_000);

  it("the link sets a new password once and signs the account out everywhere else", async () => {
    const { session: laptop, email } = await freshUser("reset-use", { password: "the-first-password" });
    expect((await laptop.get("/api/auth/me")).status).toBe(200);

    await new ApiSession().post("/api/auth/password-reset", { email });
    const token = linkIn(await waitForMail(email, 2), "/reset-password/") // the first mail was the sign-up link
      .pathname.split("/")
      .pop()!;

    const altered = (token[0] === "A" ? "B" : "A") + token.slice(1);
    expect(
      (
        await new ApiSession().post("/api/auth/password-reset/confirm", {
          token: altered,
          password: "a-hijacked-password",
        })
      ).status,
    ).toBe(404);

    const phone = new ApiSession();
    const r = await phone.post("/api/auth/password-reset/confirm", { token, password: "the-second-password" });
    expect(r.status, JSON.stringify(r.json)).toBe(200);
    expect((await phone.get("/api/auth/me")).json.user.email).toBe(email);
    expect((await laptop.get("/api/auth/me")).status).toBe(401); // the other session ended

    expect((await new ApiSession().post("/api/auth/sign-in", { email, password: "the-first-password" })).status).toBe(
      401,
    );
    expect((await new ApiSession().post("/api/auth/sign-in", { email, password: "the-second-password" })).status).toBe(
      200,
    );

    const twice = await new ApiSession().post("/api/auth/password-reset/confirm", {
      token,
      password: "the-third-password-x",
    });
    expect(twice.status).toBe(409);
    expect(twice.json.error.message).toMatch(/already been used/);
  }, 60_000);
});
