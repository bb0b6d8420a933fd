// Reads the mail stand-in's outbox (scripts/lib/mail-stand-in.mjs files each message as .eml + .json in
// MAIL_OUTBOX_DIR) and parses messages back with mailparser, as a mail program would.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { simpleParser, type ParsedMail } from "mailparser";

type Summary = { id: string; to: string[]; subject: string };

function outboxDir(): string {
  const dir = process.env.MAIL_OUTBOX_DIR;
  if (!dir) throw new Error("MAIL_OUTBOX_DIR is not set: run through the test runner (npm test)");
  return dir;
}

/** A message's summary, or null while the stand-in is still writing it (the next poll reads it whole). */
function readSummary(file: string): Summary | null {
  try {
    return JSON.parse(readFileSync(file, "utf8")) as Summary;
  } catch {
    return null;
  }
}

/** Every message in the outbox addressed to `to`, oldest first, parsed. */
export async function mailTo(to: string): Promise<ParsedMail[]> {
  const dir = outboxDir();
  const ids = readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => readSummary(path.join(dir, f)))
    .filter((s): s is Summary => s !== null)
    .filter((s) => s.to.map((a) => a.toLowerCase()).includes(to.toLowerCase()))
    .map((s) => s.id);
  return Promise.all(ids.map((id) => simpleParser(readFileSync(path.join(dir, `${id}.eml`)))));
}

/** Waits (up to `ms`) for the n-th message to `to` and returns it. */
export async function waitForMail(to: string, count = 1, ms = 10_000): Promise<ParsedMail> {
  const end = Date.now() + ms;
  for (;;) {
    const mail = await mailTo(to);
    if (mail.length >= count) return mail[count - 1];
    if (Date.now() > end) throw new Error(`no message #${count} to ${to} within ${ms} ms (found ${mail.length})`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** The first link in a message's text whose path starts with `prefix` (e.g. "/invite/"). */
export function linkIn(mail: ParsedMail, prefix: string): URL {
  for (const m of (mail.text ?? "").matchAll(/https?:\/\/\S+/g)) {
    const url = new URL(m[0]);
    if (url.pathname.startsWith(prefix)) return url;
  }
  throw new Error(`no ${prefix} link in "${mail.subject}"`);
}
