// Spreadsheet ("CSV") injection, per OWASP's CSV injection guidance: a cell that starts with
// =, +, -, @, a tab or a carriage return may be run as a formula when the file is opened. We prefix
// such text with a single quote. Plain numbers ("-3.2") are left alone: a spreadsheet reads them as
// numbers, never as formulas, and a lighting file is full of negative coordinates.

const TRIGGERS = new Set(["=", "+", "-", "@", "\t", "\r"]);
const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

export function neutraliseCell(value: string): string {
  if (value === "" || !TRIGGERS.has(value[0])) return value;
  if (PLAIN_NUMBER.test(value)) return value;
  return `'${value}`;
}

/** Undoes neutraliseCell on import, so an export read back in gives the same text. */
export function restoreCell(value: string): string {
  if (value.length >= 2 && value[0] === "'" && TRIGGERS.has(value[1]) && !PLAIN_NUMBER.test(value.slice(1)))
    return value.slice(1);
  return value;
}
