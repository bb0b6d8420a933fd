// The colour field holds what goes in the frame: filters joined by "+", colour first, then any
// diffusion, e.g. "pale blue + light frost" or "straw+heavy frost". Words for an empty frame (N/C, open, none) mean no cut.
// This is Throwline's convention; a file from elsewhere is read the same way.

const NO_COLOUR = new Set(["", "n/c", "nc", "no colour", "no color", "open", "none", "o/w", "-", "clear"]);

/** The filters in a colour field, in frame order, with tidy spacing; [] for an open frame. */
export function parseColour(text: string | null | undefined): string[] {
  if (!text) return [];
  return text
    .split("+")
    .map((part) => part.trim().replace(/\s+/g, " "))
    .filter((part) => !NO_COLOUR.has(part.toLowerCase()));
}

/** The field written back in the house style: "pale blue + light frost". */
export function formatColour(filters: string[]): string {
  return filters.join(" + ");
}
