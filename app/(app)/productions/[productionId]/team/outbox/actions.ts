"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { memberAction } from "@/lib/auth/member-action";
import { retryQueuedMail } from "@/lib/mail/send";

/** Tries every queued message whose next attempt is due now, instead of waiting for the minute timer. */
export const retryMailAction = memberAction("team.manage", z.object({}), async (_input, { productionId }) => {
  const sent = await retryQueuedMail();
  revalidatePath(`/productions/${productionId}/team/outbox`);
  return {
    message: sent
      ? `${sent} queued message${sent === 1 ? "" : "s"} sent.`
      : "Nothing was sent: the queue is empty or the mail server still refuses (see each message).",
  };
});
