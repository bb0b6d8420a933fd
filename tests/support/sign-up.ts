// Sign-up as a person does it: ask with a name and an address, read the link from the mail the stand-in
// captured, finish with a password. Used by every test that needs a fresh account (integration and e2e).
import { randomBytes } from "node:crypto";
import { linkIn, mailTo, waitForMail } from "./outbox";

/** A POST with extra headers, answering status and JSON: ApiSession's or a browser page's request. */
export type Post = (
  path: string,
  body: unknown,
  headers: Record<string, string>,
) => Promise<{ status: number; json: any }>;

/**
 * A client address of its own (IPv6 documentation range) for each request, sent as X-Forwarded-For, so
 * the per-address limit on sign-up requests counts each test apart from the rest of the suite.
 */
export const testClientAddress = () => `2001:db8::${randomBytes(6).toString("hex").match(/.{4}/g)!.join(":")}`;

export const TEST_PASSWORD = "a-long-test-password";

/** Asks to sign up and returns the token of the link mailed to the address. */
export async function signUpLinkToken(post: Post, a: { email: string; name: string; from?: string }): Promise<string> {
  const before = (await mailTo(a.email)).length;
  const r = await post(
    "/api/auth/sign-up",
    { name: a.name, email: a.email },
    { "x-forwarded-for": a.from ?? testClientAddress() },
  );
  if (r.status !== 202) throw new Error(`sign-up request failed: ${r.status} ${JSON.stringify(r.json)}`);
  const mail = await waitForMail(a.email, before + 1, 20_000);
  return linkIn(mail, "/sign-up/").pathname.split("/").pop()!;
}

/** The whole sign-up: request, the mailed link, a password. Returns the finishing answer ({ user, landing }). */
export async function signUpThroughMail(
  post: Post,
  a: { email: string; name: string; password?: string; from?: string },
): Promise<{ user: { id: number; email: string; name: string }; landing: string }> {
  const token = await signUpLinkToken(post, a);
  const r = await post(
    "/api/auth/sign-up/complete",
    { token, name: a.name, password: a.password ?? TEST_PASSWORD },
    {},
  );
  if (r.status !== 201) throw new Error(`sign-up failed: ${r.status} ${JSON.stringify(r.json)}`);
  return r.json;
}

type BrowserRequest = {
  post(
    url: string,
    o: { data: unknown; headers: Record<string, string> },
  ): Promise<{
    status(): number;
    text(): Promise<string>;
  }>;
};

/** A browser page's request context as a Post: the session cookie it gets is the page's. */
export const postViaBrowser =
  (page: { request: BrowserRequest }): Post =>
  async (path, body, headers) => {
    const r = await page.request.post(path, { data: body, headers });
    const text = await r.text();
    return { status: r.status(), json: text ? JSON.parse(text) : null };
  };
