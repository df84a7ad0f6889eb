/** The texts of every e-mail Slotwise sends. Plain text; links are absolute. */

export interface Mail {
  to: string;
  subject: string;
  text: string;
}

const signature = '\n\n-- \nSlotwise';

export function reviewInvitationMail(input: { to: string; customerName: string; designName: string; inviterName: string; reviewUrl: string; setPasswordUrl?: string }): Mail {
  const account = input.setPasswordUrl
    ? `An account was made for you. Choose your password here (the link works once, for 7 days):\n${input.setPasswordUrl}\n\nThen open the design:`
    : 'Sign in with your Slotwise account and open the design:';
  return {
    to: input.to,
    subject: `Please review "${input.designName}"`,
    text: `Hello ${input.customerName},\n\n${input.inviterName} asks you to review the frame design "${input.designName}". You can turn it around, pin comments to parts, and approve it or ask for changes.\n\n${account}\n${input.reviewUrl}${signature}`,
  };
}

export function newCommentMail(input: { to: string; designName: string; authorName: string; body: string; partId: string | null; reviewUrl: string }): Mail {
  const where = input.partId ? ` on part ${input.partId}` : '';
  return {
    to: input.to,
    subject: `New comment on "${input.designName}"`,
    text: `${input.authorName} commented${where}:\n\n${input.body}\n\nOpen the review:\n${input.reviewUrl}${signature}`,
  };
}

export function decisionMail(input: { to: string; designName: string; revision: number; deciderName: string; decision: 'approved' | 'changes_requested'; note: string; url: string }): Mail {
  const approved = input.decision === 'approved';
  const note = input.note ? `\n\nTheir note:\n${input.note}` : '';
  return {
    to: input.to,
    subject: approved ? `"${input.designName}" revision ${input.revision} approved` : `Changes requested on "${input.designName}" revision ${input.revision}`,
    text: `${input.deciderName} ${approved ? 'approved' : 'asked for changes to'} revision ${input.revision} of "${input.designName}".${note}\n\n${input.url}${signature}`,
  };
}

export function readOnlyLinkMail(input: { to: string; designName: string; senderName: string; linkUrl: string; expiresAt: string | null }): Mail {
  const expiry = input.expiresAt ? `\nThe link works until ${input.expiresAt.slice(0, 10)}.` : '';
  return {
    to: input.to,
    subject: `${input.senderName} shared "${input.designName}" with you`,
    text: `${input.senderName} shared a read-only view of the frame design "${input.designName}". No account is needed:\n${input.linkUrl}${expiry}${signature}`,
  };
}

export function passwordResetMail(input: { to: string; name: string; resetUrl: string; validMinutes: number }): Mail {
  return {
    to: input.to,
    subject: 'Reset your Slotwise password',
    text: `Hello ${input.name},\n\nSomeone (we hope you) asked to reset the password of this Slotwise account. Choose a new password here; the link works once, for ${input.validMinutes} minutes:\n${input.resetUrl}\n\nIf you did not ask, ignore this message; your password stays as it is.${signature}`,
  };
}
