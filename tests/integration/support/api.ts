// A small HTTP client with a cookie jar, for integration tests through the real route handlers.
import { DEMO_PASSWORD, DEMO_USERS, type DemoRole, demoIdFrom } from "../../support/demo";
import { type Post, signUpThroughMail, TEST_PASSWORD } from "../../support/sign-up";

export { DEMO_PASSWORD, DEMO_USERS };
export const BASE_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";

/**
 * fetch, retried once when a kept-alive socket was closed by the server just as it was reused
 * (the server's keep-alive timeout racing a slow test step); the request never reached the app.
 */
async function fetchOnce(url: string, init: RequestInit): Promise<Response> {
  try {
    return await fetch(url, init);
  } catch (err) {
    const cause = (err as { cause?: { code?: string; message?: string } }).cause;
    if (cause?.code === "UND_ERR_SOCKET" || /other side closed/.test(cause?.message ?? "")) return fetch(url, init);
    throw err;
  }
}

export class ApiSession {
  /** The session cookie as a request header value, for raw fetches (multipart, binary downloads). */
  cookie = "";

  async request(method: string, path: string, body?: unknown, rawBody?: string, headers: Record<string, string> = {}) {
    const res = await fetchOnce(BASE_URL + path, {
      method,
      redirect: "manual",
      headers: {
        ...headers,
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...(body !== undefined || rawBody !== undefined ? { "content-type": "application/json" } : {}),
      },
      body: rawBody ?? (body !== undefined ? JSON.stringify(body) : undefined),
    });
    const setCookie = res.headers.getSetCookie();
    for (const c of setCookie) {
      const [pair] = c.split(";");
      this.cookie = pair.endsWith("=") ? "" : pair;
    }
    const text = await res.text();
    let json: any = null;
    try {
      json = text ? JSON.parse(text) : null;
    } catch {
      json = { raw: text };
    }
    return { status: res.status, json };
  }

  get = (path: string) => this.request("GET", path);
  post = (path: string, body?: unknown) => this.request("POST", path, body);
  patch = (path: string, body?: unknown) => this.request("PATCH", path, body);

  async signIn(email: string, password = DEMO_PASSWORD) {
    const r = await this.post("/api/auth/sign-in", { email, password });
    if (r.status !== 200) throw new Error(`sign-in failed for ${email}: ${r.status} ${JSON.stringify(r.json)}`);
    return this;
  }
}

export const uniqueEmail = (tag: string) => `${tag}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.test`;

/** This session as a sign-up helper's POST (tests/support/sign-up.ts). */
export const postVia =
  (s: ApiSession): Post =>
  (path, body, headers) =>
    s.request("POST", path, body, undefined, headers);

/**
 * A fresh account, signed up the way a person does it (the link read from the mail stand-in's capture),
 * and its signed-in session.
 */
export async function freshUser(tag: string, opts: { password?: string } = {}) {
  const s = new ApiSession();
  const email = uniqueEmail(tag);
  const { user } = await signUpThroughMail(postVia(s), {
    name: `Test ${tag}`,
    email,
    password: opts.password ?? TEST_PASSWORD,
  });
  return { session: s, email, user };
}

/** A session of one of the demo accounts. */
export const demoSession = (role: DemoRole) => new ApiSession().signIn(DEMO_USERS[role]);

export async function demoProductionId(session: ApiSession): Promise<number> {
  return demoIdFrom((await session.get("/api/productions")).json);
}

/** A raw GET with the session's cookie, for binary bodies. */
export async function getBytes(s: ApiSession, path: string) {
  const res = await fetchOnce(BASE_URL + path, { headers: { cookie: s.cookie } });
  return {
    status: res.status,
    headers: res.headers,
    type: res.headers.get("content-type") ?? "",
    bytes: Buffer.from(await res.arrayBuffer()),
  };
}

/** A multipart POST with the session's cookie; the body is any form the route reads. */
export async function postForm(s: ApiSession, path: string, form: FormData) {
  const res = await fetchOnce(BASE_URL + path, { method: "POST", headers: { cookie: s.cookie }, body: form });
  const text = await res.text();
  let json: any;
  try {
    json = JSON.parse(text);
  } catch {
    json = { raw: text };
  }
  return { status: res.status, json };
}
