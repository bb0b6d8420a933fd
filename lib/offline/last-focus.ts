// Which production this device last followed on the focus call, so the installed app (the manifest's
// start_url, /focus) opens straight into it. A plain cookie: the server reads it to redirect, and it is only a
// preference (membership is checked again by the focus call page itself).
export const LAST_FOCUS_COOKIE = "throwline-last-focus";

/** Remembers the production for a year, on this device only. */
export function rememberFocusProduction(productionId: number) {
  // biome-ignore lint/suspicious/noDocumentCookie: one plain preference cookie, no Cookie Store API in older tablets
  document.cookie = `${LAST_FOCUS_COOKIE}=${productionId}; path=/; max-age=31536000; SameSite=Lax`;
}

/** The production to open: the remembered one if the person is still a member of it, else their only one. */
export function pickFocusProduction(remembered: string | undefined, memberOf: number[]): number | null {
  const id = remembered && /^\d{1,10}$/.test(remembered) ? Number(remembered) : null;
  if (id != null && memberOf.includes(id)) return id;
  return memberOf.length === 1 ? memberOf[0] : null;
}
