import type { MailText } from "./messages";

// The two answers to a sign-up request. The page says the same thing either way; only the mailbox's
// owner learns whether an account already uses the address.

/** To an address with no account: the link that finishes creating one. */
export function signUpMessage(a: { name: string; link: string; expiresAt: Date }): MailText {
  return {
    subject: "Finish creating your Throwline account",
    text: [
      `Hello ${a.name},`,
      "",
      "Someone (we hope you) asked to create a Throwline account with this address.",
      "Open this link to choose a password and finish (it works once):",
      a.link,
      "",
      `The link expires on ${a.expiresAt.toUTCString()}.`,
      "Then start a production of your own, or join the productions that have invited this address.",
      "If you did not ask, ignore this message: no account is made unless the link is opened and finished.",
    ].join("\n"),
  };
}

/** To an address that already has an account: no second account, but the way back in. */
export function signUpExistingAccountMessage(a: { signInLink: string; resetLink: string; expiresAt: Date }): MailText {
  return {
    subject: "Someone tried to create a Throwline account with your address",
    text: [
      "Someone (perhaps you) tried to create a Throwline account with this address, but you already have one.",
      "",
      `To use it, sign in at ${a.signInLink}`,
      "If you have forgotten the password, choose a new one with this link (it works once):",
      a.resetLink,
      "",
      `The link expires on ${a.expiresAt.toUTCString()}. Choosing a new password signs the account out everywhere else.`,
      "If it was not you, ignore this message: nothing has changed.",
    ].join("\n"),
  };
}
