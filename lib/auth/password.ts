import "server-only";
import bcrypt from "bcryptjs";

// bcrypt (pure JavaScript, no native build) at cost 11: ~100-200 ms per check on this hardware.
const COST = 11;

export const hashPassword = (plain: string) => bcrypt.hash(plain, COST);
export const verifyPassword = (plain: string, hash: string) => bcrypt.compare(plain, hash);

// Compared against when the e-mail is unknown, so both failures take the same time.
export const DUMMY_HASH = "$2b$11$iMmVDkPRzAFm4K4.GYTAE.maKZjN2q2oToc3Ml6Wda6QbWIIMaeJi";
