import "server-only";
import { createHash, randomBytes } from "node:crypto";

// Links in mail carry 256 random bits; the database keeps only the SHA-256, so a link cannot be guessed,
// altered into another valid one, or rebuilt from a copy of the tables.
export const newLinkToken = () => randomBytes(32).toString("base64url");
export const hashLinkToken = (token: string) => createHash("sha256").update(token).digest("hex");

/** A token as it appears in a link: 43 base64url characters. Anything else is refused before any lookup. */
export const LINK_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export const INVITATION_TTL_DAYS = 7;
export const RESET_TTL_MINUTES = 60;
// A day: long enough to finish from another device or after a rehearsal, short enough that an old mail
// in a shared inbox is no standing offer. Common practice, no source.
export const SIGN_UP_TTL_HOURS = 24;
