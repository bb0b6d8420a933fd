import "server-only";
import { after } from "next/server";
import { env } from "@/lib/env";
import {
  claimMail,
  dueMail,
  enqueueMail,
  markMailFailed,
  markMailSent,
  type MailAttachment,
  type QueuedMail,
  queuedMailOfProduction,
} from "@/lib/data/mail-queue";
import { mailTransport } from "./transport";

export type Outgoing = {
  productionId: number | null;
  to: string;
  subject: string;
  text: string;
  attachments?: MailAttachment[];
};
export type SendOutcome = { queuedId: number; sent: boolean; error?: string };

/** Hands one message to the mail server; the caller holds its claim (enqueueMail's, or claimMail's). */
async function deliver(m: QueuedMail): Promise<SendOutcome> {
  const transport = mailTransport();
  if (!transport) {
    const error = "No mail server is set up (SMTP_URL); the message waits in the queue.";
    await markMailFailed(m.id, m.attempts, error);
    return { queuedId: m.id, sent: false, error };
  }
  try {
    const attachments = m.attachments?.map((a) => ({
      filename: a.filename,
      contentType: a.contentType,
      content: Buffer.from(a.base64, "base64"),
    }));
    await transport.sendMail({ from: env().MAIL_FROM, to: m.to, subject: m.subject, text: m.text, attachments });
    await markMailSent(m.id);
    return { queuedId: m.id, sent: true };
  } catch (err) {
    const error = `The mail server refused or did not answer: ${err instanceof Error ? err.message : String(err)}`;
    await markMailFailed(m.id, m.attempts, error);
    return { queuedId: m.id, sent: false, error };
  }
}

let retryTimer: ReturnType<typeof setInterval> | null = null;

/**
 * Tries every queued message whose time has come; returns how many went out. With a production, every
 * message of that production still queued is tried now, whatever its wait (the outbox's "try now").
 */
export async function retryQueuedMail(opts: { productionId?: number } = {}): Promise<number> {
  let sent = 0;
  const queued = opts.productionId ? await queuedMailOfProduction(opts.productionId) : await dueMail();
  for (const m of queued) {
    // Listed is not owned: another try may have taken it since the list was read.
    if (!(await claimMail(m.id, { dueOnly: !opts.productionId }))) continue;
    if ((await deliver(m)).sent) sent++;
  }
  return sent;
}

function keepRetrying() {
  if (retryTimer) return;
  retryTimer = setInterval(() => void retryQueuedMail().catch(() => undefined), 60_000);
  retryTimer.unref?.();
}

/**
 * Queues a message, then tries to hand it to the mail server at once. A failure never fails the
 * caller's action: the message stays queued with the reason and is retried (every minute while the
 * process runs, and whenever more mail is sent or the outbox is opened).
 */
export async function sendMail(message: Outgoing): Promise<SendOutcome> {
  const queued = await enqueueMail(message);
  keepRetrying();
  return deliver(queued);
}

/**
 * Queues a message and hands it to the mail server only after the response has gone out. For account
 * mail (sign-up, password reset): the answer to the request then takes the same time whichever message
 * it queued and however slow the mail server is, so neither reveals whether the address has an account.
 */
export async function queueMail(message: Outgoing): Promise<{ queuedId: number }> {
  const queued = await enqueueMail(message);
  keepRetrying();
  after(() => deliver(queued).catch(() => undefined));
  return { queuedId: queued.id };
}
