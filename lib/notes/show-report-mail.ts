import "server-only";
// The show report e-mailed to the production's team once it is filed. A mail server that is down leaves the
// messages queued (lib/mail retries them); filing never fails because of mail.
import { sendMail } from "@/lib/mail/send";
import { getTeamByProduction } from "@/lib/data/memberships";
import { requireProduction } from "@/lib/data/productions";
import type { NoteDto, ShowReportDto } from "./dto";
import { showReportText } from "./show-report-text";

export async function mailShowReport(
  productionId: number,
  report: ShowReportDto,
  notes: NoteDto[],
): Promise<{ sent: number; queued: number }> {
  const [team, production] = await Promise.all([
    getTeamByProduction({ productionId }),
    requireProduction(productionId),
  ]);
  const message = showReportText(production.name, report, notes);
  let sent = 0;
  let queued = 0;
  for (const m of team) {
    const outcome = await sendMail({ productionId, to: m.email, ...message }).catch(() => ({ sent: false }));
    if (outcome.sent) sent++;
    else queued++;
  }
  return { sent, queued };
}
