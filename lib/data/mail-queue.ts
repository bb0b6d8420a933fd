import "server-only";
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";

// Every message is written here before it is handed to the SMTP server, so a server that is down loses
// nothing: the row stays queued with the failure, and is tried again later.
/** A file sent with a message, kept with it (base64) so a retry sends the same bytes. */
export type MailAttachment = { filename: string; contentType: string; base64: string };
export type QueuedMail = {
  id: number;
  productionId: number | null;
  to: string;
  subject: string;
  text: string;
  attempts: number;
  attachments?: MailAttachment[];
};
export type MailRecord = QueuedMail & {
  status: "queued" | "sent";
  lastError: string | null;
  sentAt: Date | null;
  createdAt: Date;
};

/**
 * How long a claim on a message holds: far longer than handing one message to the mail server takes, short
 * enough that a claim left by a server that stopped mid-send soon runs out and the message is tried again.
 */
export const CLAIM_SECONDS = 120;

/** The wait before the next try after `attempts` failures: 1, 2, 4 … minutes, at most an hour. */
export const retryDelaySeconds = (attempts: number) => Math.min(3600, 60 * 2 ** Math.max(0, attempts - 1));

export async function enqueueMail(m: {
  productionId: number | null;
  to: string;
  subject: string;
  text: string;
  attachments?: MailAttachment[];
}): Promise<QueuedMail> {
  const files = m.attachments?.length ? JSON.stringify(m.attachments) : null;
  // Written already claimed by the send that follows, so no retry (here or on another server) takes it meanwhile.
  const [id] = await getDb().sequelize.query(
    `INSERT INTO outgoing_mail (production_id, to_address, subject, body_text, attachments, sending_until)
     VALUES (?, ?, ?, ?, ?, NOW(3) + INTERVAL ${CLAIM_SECONDS} SECOND)`,
    { replacements: [m.productionId, m.to, m.subject.slice(0, 300), m.text, files], type: QueryTypes.INSERT },
  );
  return { id: Number(id), ...m, attempts: 0 };
}

/** Not claimed by a send in progress (or its claim ran out). */
const UNCLAIMED = "(sending_until IS NULL OR sending_until < NOW(3))";

/**
 * Claims a queued message for one try: true when this caller may send it; false when it was sent meanwhile
 * or another try holds it (the send right after queuing, the retry timer, another app server). With
 * `dueOnly`, a message whose next try is not due yet is left alone too (the outbox's "try now" passes false).
 */
export async function claimMail(id: number, { dueOnly = true } = {}): Promise<boolean> {
  const [, affected] = await getDb().sequelize.query(
    `UPDATE outgoing_mail SET sending_until = NOW(3) + INTERVAL ${CLAIM_SECONDS} SECOND
      WHERE id = ? AND status = 'queued' AND ${UNCLAIMED}${dueOnly ? " AND next_attempt_at <= NOW(3)" : ""}`,
    { replacements: [id], type: QueryTypes.UPDATE },
  );
  return Number(affected) === 1;
}

export async function markMailSent(id: number): Promise<void> {
  await getDb().sequelize.query(
    "UPDATE outgoing_mail SET status = 'sent', sent_at = NOW(3), attempts = attempts + 1, last_error = NULL, sending_until = NULL, updated_at = NOW(3) WHERE id = ?",
    { replacements: [id] },
  );
}

export async function markMailFailed(id: number, attemptsBefore: number, error: string): Promise<void> {
  await getDb().sequelize.query(
    "UPDATE outgoing_mail SET attempts = attempts + 1, last_error = ?, next_attempt_at = NOW(3) + INTERVAL ? SECOND, sending_until = NULL, updated_at = NOW(3) WHERE id = ?",
    { replacements: [error.slice(0, 500), retryDelaySeconds(attemptsBefore + 1), id] },
  );
}

/** Queued messages whose next try is due, oldest first. */
export async function dueMail(limit = 20): Promise<QueuedMail[]> {
  const rows = await getDb().sequelize.query<QueuedMail & { files: string | null }>(
    `SELECT id, production_id AS productionId, to_address AS \`to\`, subject, body_text AS text, attempts,
            attachments AS files
       FROM outgoing_mail WHERE status = 'queued' AND next_attempt_at <= NOW(3) AND ${UNCLAIMED} ORDER BY id LIMIT ?`,
    { replacements: [limit], type: QueryTypes.SELECT },
  );
  return rows.map(withAttachments);
}

const withAttachments = ({ files, ...m }: QueuedMail & { files: string | null }): QueuedMail => ({
  ...m,
  attachments: files ? JSON.parse(files) : undefined,
});

/** A production's messages still queued, due or not, oldest first (the outbox's "try now"). */
export async function queuedMailOfProduction(productionId: number, limit = 100): Promise<QueuedMail[]> {
  const rows = await getDb().sequelize.query<QueuedMail & { files: string | null }>(
    `SELECT id, production_id AS productionId, to_address AS \`to\`, subject, body_text AS text, attempts,
            attachments AS files
       FROM outgoing_mail WHERE status = 'queued' AND production_id = ? AND ${UNCLAIMED} ORDER BY id LIMIT ?`,
    { replacements: [productionId, limit], type: QueryTypes.SELECT },
  );
  return rows.map(withAttachments);
}

/** A production's mail, newest first, for the outbox page. */
export async function mailForProduction(productionId: number, limit = 100): Promise<MailRecord[]> {
  return getDb().sequelize.query<MailRecord>(
    `SELECT id, production_id AS productionId, to_address AS \`to\`, subject, body_text AS text, attempts, status,
            last_error AS lastError, sent_at AS sentAt, created_at AS createdAt
       FROM outgoing_mail WHERE production_id = ? ORDER BY id DESC LIMIT ?`,
    { replacements: [productionId, limit], type: QueryTypes.SELECT },
  );
}
