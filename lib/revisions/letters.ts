// Revision letters: A, B, C … Z, then AA, AB …; I and O are left out because on a printed page they read
// as 1 and 0 (common practice on drawings, from memory).
const LETTERS = "ABCDEFGHJKLMNPQRSTUVWXYZ";

/** The n-th letter label, 0-based: 0 → A, 23 → Z, 24 → AA. */
export function letterAt(n: number): string {
  let label = "";
  let i = n;
  do {
    label = LETTERS[i % LETTERS.length] + label;
    i = Math.floor(i / LETTERS.length) - 1;
  } while (i >= 0);
  return label;
}

/** The position of a letter label in the sequence, or null for a typed label such as "Tech 2". */
export function letterIndex(label: string): number | null {
  if (!/^[A-Z]{1,3}$/.test(label)) return null;
  let n = 0;
  for (const ch of label) {
    const d = LETTERS.indexOf(ch);
    if (d < 0) return null;
    n = n * LETTERS.length + d + 1;
  }
  return n - 1;
}

/** The next free letter after the highest letter already used (typed labels do not count). */
export function nextLetter(used: string[]): string {
  const taken = new Set(used.map((l) => l.toUpperCase()));
  const highest = Math.max(-1, ...used.map((l) => letterIndex(l) ?? -1));
  let n = highest + 1;
  while (taken.has(letterAt(n))) n++;
  return letterAt(n);
}
