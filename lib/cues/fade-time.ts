// Fade times as people type them: `5`, `5.5`, `1:30` (minutes:seconds), `1:02:30` (hours too),
// and a split time `3/8` (up 3 s, down 8 s). Stored in seconds.

export const MAX_FADE_SECONDS = 24 * 3600;

/** Seconds from `5`, `5.5`, `1:30`, `1:02:30`; throws a RangeError that says what was wrong. */
export function parseFadeTime(text: string, what = "Time"): number {
  const t = String(text).trim();
  const hint = "use seconds such as 5 or 5.5, or minutes:seconds such as 1:30";
  if (!t) throw new RangeError(`${what} is empty: ${hint}`);
  const parts = t.split(":");
  if (
    parts.length > 3 ||
    !parts.every((p, i) => (i === parts.length - 1 ? /^\d+(\.\d+)?$|^\.\d+$/ : /^\d+$/).test(p))
  ) {
    throw new RangeError(`${what} "${t}" is not a time: ${hint}`);
  }
  const nums = parts.map(Number);
  if (parts.length > 1 && nums.slice(1).some((n) => n >= 60)) {
    throw new RangeError(`${what} "${t}": minutes and seconds after a colon must be below 60`);
  }
  const seconds = nums.reduce((acc, n) => acc * 60 + n, 0);
  if (seconds > MAX_FADE_SECONDS) throw new RangeError(`${what} "${t}" is longer than 24 hours`);
  return Math.round(seconds * 1000) / 1000;
}

/** `3` → up 3, down same (null); `3/8` → up 3, down 8. */
export function parseSplitTime(text: string): { up: number; down: number | null } {
  const t = String(text).trim();
  const halves = t.split("/");
  if (halves.length > 2) throw new RangeError(`"${t}" has more than one "/": write up/down, such as 3/8`);
  const up = parseFadeTime(halves[0], "Up time");
  const down = halves.length === 2 ? parseFadeTime(halves[1], "Down time") : null;
  return { up, down };
}

/** 5 → "5", 5.5 → "5.5", 90 → "1:30", 3725 → "1:02:05". */
export function formatFadeTime(seconds: number): string {
  const s = Math.round(seconds * 100) / 100;
  if (s < 60) return trim(s);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const rest = Math.round((s - h * 3600 - m * 60) * 100) / 100;
  const sec = (rest < 10 ? "0" : "") + trim(rest);
  return h ? `${h}:${String(m).padStart(2, "0")}:${sec}` : `${m}:${sec}`;
}

function trim(n: number) {
  return String(Math.round(n * 100) / 100);
}

/** "3/8" for split times, "5" when down equals up or is not set. */
export function formatSplitTime(up: number, down: number | null): string {
  return down == null || down === up ? formatFadeTime(up) : `${formatFadeTime(up)}/${formatFadeTime(down)}`;
}
