// The local stand-in for an SMTP relay: accepts mail on loopback and files each message in an
// outbox folder (raw .eml plus a .json summary) that the app's outbox page and the tests read.
import { mkdirSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { ROOT } from "./project.mjs";

export async function startMailStandIn({ port, outboxDir }) {
  // Loaded lazily: node modules may have been installed only moments ago by the same run.
  const require = createRequire(path.join(ROOT, "package.json"));
  const { SMTPServer } = require("smtp-server");
  const { simpleParser } = require("mailparser");
  mkdirSync(outboxDir, { recursive: true });
  let seq = 0;
  const server = new SMTPServer({
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    size: 25 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks = [];
      stream.on("data", (c) => chunks.push(c));
      stream.on("end", async () => {
        try {
          const raw = Buffer.concat(chunks);
          const parsed = await simpleParser(raw);
          const id = `${Date.now()}-${String(++seq).padStart(4, "0")}`;
          writeFileSync(path.join(outboxDir, `${id}.eml`), raw);
          writeFileSync(
            path.join(outboxDir, `${id}.json`),
            JSON.stringify(
              {
                id,
                receivedAt: new Date().toISOString(),
                from: session.envelope.mailFrom?.address ?? null,
                to: session.envelope.rcptTo.map((r) => r.address),
                subject: parsed.subject ?? "",
                text: parsed.text ?? "",
                attachments: (parsed.attachments ?? []).map((a) => ({
                  filename: a.filename,
                  contentType: a.contentType,
                  size: a.size,
                })),
              },
              null,
              2,
            ),
          );
          callback();
        } catch (err) {
          callback(err);
        }
      });
    },
  });
  await new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", resolve);
  });
  return {
    url: `smtp://127.0.0.1:${port}`,
    outboxDir,
    stop: () => new Promise((resolve) => server.close(resolve)),
  };
}
