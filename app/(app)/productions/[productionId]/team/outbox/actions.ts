"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { memberAction } from "@/lib/auth/member-action";
import { retryQueuedMail } from "@/lib/mail/send";

/** Tries every message of this production still queued now, instead of waiting for its next turn. */
export const retryMailAction = memberAction("team.manage", z.object({}), async (_input, { productionId }) => {
  const sent = await retryQueuedMail({ productionId });
  revalidatePath(`/productions/${productionId}/team/outbox`);
  return {
    message: sent
      ? `${sent} queued message${sent === 1 ? "" : "s"} sent.`
      : "Nothing was sent: the queue is empty or the mail server still refuses (see each message).",
  };
});
