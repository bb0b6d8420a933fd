import { ROLE_LABELS, type Role } from "@/lib/auth/roles";

// The words of Throwline's account and team mail, plain text (every mail program shows it the same).
export type MailText = { subject: string; text: string };

export function invitationMessage(a: {
  productionName: string;
  role: Role;
  inviterName: string;
  link: string;
  expiresAt: Date;
}): MailText {
  return {
    subject: `You are invited to ${a.productionName} on Throwline`,
    text: [
      `${a.inviterName} invites you to join the lighting paperwork of "${a.productionName}" as ${ROLE_LABELS[a.role].toLowerCase()}.`,
      "",
      "Open this link to accept (it works once):",
      a.link,
      "",
      `The link expires on ${a.expiresAt.toUTCString()}.`,
      "If you did not expect this invitation, ignore this message; nothing happens unless the link is opened and accepted.",
    ].join("\n"),
  };
}

export function passwordResetMessage(a: { link: string; expiresAt: Date }): MailText {
  return {
    subject: "Choose a new Throwline password",
    text: [
      "Someone (we hope you) asked to choose a new password for the Throwline account at this address.",
      "",
      "Open this link to choose one (it works once):",
      a.link,
      "",
      `The link expires on ${a.expiresAt.toUTCString()}. Choosing a new password signs this account out everywhere else.`,
      "If you did not ask, ignore this message: your password stays as it is.",
    ].join("\n"),
  };
}

/** Sent instead of a reset link when no account uses the address, so the form's answer is the same either way. */
export function noAccountMessage(a: { signUpHint: string }): MailText {
  return {
    subject: "Throwline password request",
    text: [
      "Someone asked to reset the Throwline password for this address, but no Throwline account uses it.",
      a.signUpHint,
      "If you did not ask, ignore this message.",
    ].join("\n"),
  };
}
