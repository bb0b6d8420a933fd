// The local stand-in for an SMTP relay: accepts mail on loopback and files each message in an
// outbox folder (raw .eml plus a .json summary) that the app's outbox page and the tests read.
// While a file named STOPPED_FILE exists in the outbox folder the stand-in stops listening, like a mail
// server that is down (connections refused); removing the file starts it again on the same port. The
// mail-outage tests use this to show that queued mail survives an outage and goes out on retry.
import { existsSync, mkdirSync, rmSync, unwatchFile, watchFile, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { ROOT } from "./project.mjs";

export const STOPPED_FILE = "stand-in-stopped";

export async function startMailStandIn({ port, outboxDir }) {
  // Loaded lazily: node modules may have been installed only moments ago by the same run.
  const require = createRequire(path.join(ROOT, "package.json"));
  const { SMTPServer } = require("smtp-server");
  const { simpleParser } = require("mailparser");
  mkdirSync(outboxDir, { recursive: true });
  let seq = 0;
  const makeServer = () =>
    new SMTPServer({
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
  let server = null;
  const listen = () =>
    new Promise((resolve, reject) => {
      const next = makeServer();
      next.once("error", reject);
      next.listen(port, "127.0.0.1", () => {
        server = next;
        resolve();
      });
    });
  // Closing stops new connections at once; the callback waits for open ones, which need not hold us up.
  const close = () => {
    const current = server;
    server = null;
    return new Promise((resolve) => (current ? current.close(resolve) : resolve()));
  };
  const controlFile = path.join(outboxDir, STOPPED_FILE);
  rmSync(controlFile, { force: true }); // a run that ended while stopped leaves none behind
  await listen();

  let switching = Promise.resolve();
  watchFile(controlFile, { interval: 100 }, () => {
    switching = switching
      .then(async () => {
        const stopped = existsSync(controlFile);
        if (stopped && server) void close();
        else if (!stopped && !server) await listen();
      })
      .catch((err) => process.stderr.write(`mail stand-in: ${err.message}\n`));
  });
  return {
    url: `smtp://127.0.0.1:${port}`,
    outboxDir,
    stop: async () => {
      unwatchFile(controlFile);
      await switching;
      await close();
    },
  };
}
