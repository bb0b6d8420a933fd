// The browser's way to call our route handlers: a non-2xx reply becomes an ApiError carrying the
// same code, message, field errors and (for 409) the current row that the server sent.
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
    readonly current?: unknown,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function apiFetch<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  const res = await fetch(url, {
    ...rest,
    headers: { ...(json !== undefined ? { "content-type": "application/json" } : {}), ...rest.headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  const body = await res.json().catch(() => null);
  if (!res.ok) {
    const e = body?.error ?? {};
    throw new ApiError(
      res.status,
      e.code ?? "internal",
      e.message ?? `Request failed (${res.status})`,
      e.fieldErrors,
      e.current,
    );
  }
  return body as T;
}
