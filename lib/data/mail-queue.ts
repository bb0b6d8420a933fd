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
  const [id] = await getDb().sequelize.query(
    "INSERT INTO outgoing_mail (production_id, to_address, subject, body_text, attachments) VALUES (?, ?, ?, ?, ?)",
    { replacements: [m.productionId, m.to, m.subject.slice(0, 300), m.text, files], type: QueryTypes.INSERT },
  );
  return { id: Number(id), ...m, attempts: 0 };
}

export async function markMailSent(id: number): Promise<void> {
  await getDb().sequelize.query(
    "UPDATE outgoing_mail SET status = 'sent', sent_at = NOW(3), attempts = attempts + 1, last_error = NULL, updated_at = NOW(3) WHERE id = ?",
    { replacements: [id] },
  );
}

export async function markMailFailed(id: number, attemptsBefore: number, error: string): Promise<void> {
  await getDb().sequelize.query(
    "UPDATE outgoing_mail SET attempts = attempts + 1, last_error = ?, next_attempt_at = NOW(3) + INTERVAL ? SECOND, updated_at = NOW(3) WHERE id = ?",
    { replacements: [error.slice(0, 500), retryDelaySeconds(attemptsBefore + 1), id] },
  );
}

/** Queued messages whose next try is due, oldest first. */
export async function dueMail(limit = 20): Promise<QueuedMail[]> {
  const rows = await getDb().sequelize.query<QueuedMail & { files: string | null }>(
    `SELECT id, production_id AS productionId, to_address AS \`to\`, subject, body_text AS text, attempts,
            attachments AS files
       FROM outgoing_mail WHERE status = 'queued' AND next_attempt_at <= NOW(3) ORDER BY id LIMIT ?`,
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
       FROM outgoing_mail WHERE status = 'queued' AND production_id = ? ORDER BY id LIMIT ?`,
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
