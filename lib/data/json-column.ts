import "server-only";
// A JSON column arrives parsed through a model's getter but as its text from a raw query (and from some
// driver paths), so every reader of one goes through here.

/** The column's value, parsed when it came as text; null stays null. */
export function jsonColumn<T>(value: unknown): T {
  return (typeof value === "string" ? JSON.parse(value) : value) as T;
}
