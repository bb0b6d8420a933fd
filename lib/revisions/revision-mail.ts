import "server-only";
// The e-mail a revision sends: every member who has not opted out gets the change summary; the stage
// manager gets the cue sheet, electricians the rig list and the changed units' focus charts, and the shop
// contact the owner named gets the add / return list. Everything goes through the mail queue: the
// revision is issued whatever the mail server does, and a refusal is retried and shown in the outbox.
import { queueMail } from "@/lib/mail/send";
import { appOrigin } from "@/lib/mail/links";
import type { MailAttachment } from "@/lib/data/mail-queue";
import { getCueSheet, getCuesByProduction } from "@/lib/data/cues";
import { exportRig } from "@/lib/data/rig-export";
import { loadFocusCharts } from "@/lib/pdf/focus-source";
import { focusWorkbook } from "@/lib/focus/excel";
import { cuesToCsv } from "@/lib/cues/table-export";
import { cuesToXlsx } from "@/lib/cues/xlsx-export";
import { compareCueNumbers } from "@/lib/cues";
import { getEquipment, equipmentFile } from "@/lib/data/revision-equipment";
import { getRevisionRecipients, getShopEmail } from "@/lib/data/revision-mail-settings";
import type { Role } from "@/models/roles";
import { revisionMailText } from "./summary-text";
import type { RevisionDiff, RevisionDto } from "./types";

const XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
const file = (filename: string, contentType: string, body: Buffer | string): MailAttachment => ({
  filename,
  contentType,
  base64: Buffer.from(body).toString("base64"),
});
const stem = (name: string) => name.replace(/[^\p{L}\p{N} _-]+/gu, "").trim() || "production";

async function cueSheetFiles(productionId: number, name: string, label: string): Promise<MailAttachment[]> {
  const cues = await getCuesByProduction({ productionId });
  const sheet = await getCueSheet({ productionId });
  const levels = new Map(cues.map((c) => [c.id, c.levels]));
  const rows = sheet.rows
    .map((r) => ({ ...r, levels: levels.get(r.id) ?? {} }))
    .sort((a, b) => compareCueNumbers(a.number, b.number));
  const base = `${stem(name)} - cue sheet rev ${label}`;
  return [
    file(`${base}.csv`, "text/csv; charset=utf-8", `\uFEFF${cuesToCsv(rows)}`),
    file(`${base}.xlsx`, XLSX, await cuesToXlsx({ title: `${name} — revision ${label}`, rows })),
  ];
}

async function electricianFiles(
  productionId: number,
  name: string,
  label: string,
  diff: RevisionDiff,
): Promise<MailAttachment[]> {
  const rig = await exportRig({ productionId, view: "workbook", format: "xlsx" });
  const out = [file(`${stem(name)} - rig rev ${label}.xlsx`, XLSX, rig.body)];
  // Focus charts of the units a crew has to go to: the new ones and the refocused ones.
  const changed = new Set([...diff.fixtures.added, ...diff.fixtures.refocused].map((l) => l.id));
  if (changed.size) {
    const { charts } = await loadFocusCharts({ productionId, filter: {} });
    const mine = charts.filter((c) => changed.has(c.id));
    if (mine.length)
      out.push(
        file(
          `${stem(name)} - changed focus charts rev ${label}.xlsx`,
          XLSX,
          await focusWorkbook(mine, { productionName: name }),
        ),
      );
  }
  return out;
}

const ATTACHMENT_WORDS: Partial<Record<Role, string>> = {
  stage_manager: "Attached: the cue sheet (CSV and Excel).",
  electrician: "Attached: the rig list and the focus charts of the new and refocused units (Excel).",
};

/** Queues the revision's messages; returns how many were queued. Never throws for a mail server's sake. */
export async function mailRevision(opts: {
  productionId: number;
  productionName: string;
  revision: RevisionDto;
  previousRevisionId: number | null;
  previousLabel: string | null;
  diff: RevisionDiff;
  sparesPercent?: number;
}): Promise<{ queued: number }> {
  const { productionId, productionName, revision, diff, previousLabel } = opts;
  const link = `${await appOrigin()}/productions/${productionId}/revisions?revision=${revision.id}`;
  const recipients = await getRevisionRecipients({ productionId });
  const files: Partial<Record<Role, MailAttachment[]>> = {};
  if (recipients.some((r) => r.role === "stage_manager"))
    files.stage_manager = await cueSheetFiles(productionId, productionName, revision.label);
  if (recipients.some((r) => r.role === "electrician"))
    files.electrician = await electricianFiles(productionId, productionName, revision.label, diff);

  const messages = recipients.map((r) => ({
    productionId,
    to: r.email,
    ...revisionMailText({
      productionName,
      revision,
      previousLabel,
      diff,
      link,
      attachmentsNote: ATTACHMENT_WORDS[r.role] ?? null,
    }),
    attachments: files[r.role],
  }));

  const shop = await getShopEmail({ productionId });
  if (shop) {
    const report = await getEquipment({
      productionId,
      of: revision.id,
      from: opts.previousRevisionId ?? undefined,
      sparesPercent: opts.sparesPercent,
    });
    const xlsx = await equipmentFile(report, "xlsx", productionName);
    const csv = await equipmentFile(report, "csv", productionName);
    const what = report.from ? `what to send and take back, ${report.from} to ${report.of}` : "the equipment list";
    messages.push({
      productionId,
      to: shop,
      subject: `${productionName}: equipment for revision ${revision.label}`,
      text: [
        `${productionName}: revision ${revision.label} has been issued.`,
        "",
        `Attached: ${what}, with ${report.sparesPercent} % spares (CSV and Excel).`,
        "",
        "Sent by Throwline for the production's lighting department.",
      ].join("\n"),
      attachments: [file(csv.fileName, csv.contentType, csv.body), file(xlsx.fileName, xlsx.contentType, xlsx.body)],
    });
  }
  for (const m of messages) await queueMail(m);
  return { queued: messages.length };
}
