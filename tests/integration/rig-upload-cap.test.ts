// The upload cap holds for a body sent without Content-Length (chunked): the server counts bytes as
// they arrive and answers 413 at the cap rather than reading the whole body first.
import { describe, expect, it } from "vitest";
import { BASE_URL } from "./support/api";
import { rigProduction } from "./support/rig";

const cookieOf = (s: unknown) => (s as { cookie: string }).cookie;

function chunkedMultipart(totalBytes: number) {
  const boundary = "----throwline-cap-test";
  const encoder = new TextEncoder();
  const head = encoder.encode(
    `--${boundary}\r\nContent-Disposition: form-data; name="options"\r\n\r\n{"mode":"preview"}\r\n--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="huge.csv"\r\nContent-Type: text/csv\r\n\r\nPosition,Unit\r\n`,
  );
  const chunk = encoder.encode("LX1,1\r\n".repeat(9362)); // about 64 KiB
  let sent = 0;
  let pulls = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      pulls++;
      if (sent === 0) {
        sent += head.byteLength;
        return controller.enqueue(head);
      }
      if (sent >= totalBytes) {
        controller.enqueue(encoder.encode(`\r\n--${boundary}--\r\n`));
        return controller.close();
      }
      sent += chunk.byteLength;
      controller.enqueue(chunk);
    },
  });
  return { body, boundary, sentBytes: () => sent, pulls: () => pulls };
}

describe("upload cap while streaming", () => {
  it("answers 413 to a chunked body past the cap, and a small chunked body is read", async () => {
    const { s, id } = await rigProduction();
    const big = chunkedMultipart(40 * 1024 * 1024);
    const res = await fetch(`${BASE_URL}/api/productions/${id}/import`, {
      method: "POST",
      headers: { cookie: cookieOf(s), "content-type": `multipart/form-data; boundary=${big.boundary}` },
      body: big.body,
      duplex: "half",
    } as RequestInit);
    expect(res.status).toBe(413);
    expect((await res.json()).error.message).toMatch(/limit/);
    // It stopped near the 8 MB cap, not after the 40 MB the client was ready to send.
    expect(big.sentBytes()).toBeLessThan(20 * 1024 * 1024);

    const small = chunkedMultipart(100 * 1024);
    const ok = await fetch(`${BASE_URL}/api/productions/${id}/import`, {
      method: "POST",
      headers: { cookie: cookieOf(s), "content-type": `multipart/form-data; boundary=${small.boundary}` },
      body: small.body,
      duplex: "half",
    } as RequestInit);
    const json = await ok.json();
    expect(ok.status, JSON.stringify(json).slice(0, 300)).toBe(200);
    // Read in full: the first row is a new unit without a Type column and every later one repeats it,
    // so every row is reported.
    expect(json.preview.rowCount).toBeGreaterThan(9000);
    expect(json.preview.errorCount).toBe(json.preview.rowCount);
  });
});
