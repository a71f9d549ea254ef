import { button, escapeHtml, frame, paragraph, type ComposedMail } from './layout.ts';

export function invitationMail(i: { acceptUrl: string; displayName: string; roleLabel: string; invitedBy: string | null; expiresHours: number }): ComposedMail {
  const subject = 'Your invitation to the Benchlight lab';
  const by = i.invitedBy ? `${i.invitedBy} invited you` : 'You are invited';
  const { html, text } = frame({
    title: subject,
    bodyHtml: `<h1 style="margin:0 0 12px;font-size:22px">Welcome, ${escapeHtml(i.displayName)}</h1>
${paragraph(`${by} to join the Benchlight lab as ${i.roleLabel}. Choose your own password to set up your account; nobody else sees it.`)}
${button(i.acceptUrl, 'Set my password')}
${paragraph(`The link works for ${i.expiresHours} hours and once. If you did not expect this, ignore it.`)}`,
    bodyText: `Welcome, ${i.displayName}

${by} to join the Benchlight lab as ${i.roleLabel}. Choose your own password to set up your account; nobody else sees it:
${i.acceptUrl}

The link works for ${i.expiresHours} hours and once. If you did not expect this, ignore it.`,
    why: 'You get this because a Benchlight admin invited this address to the staff area.',
  });
  return { subject, html, text };
}

export function passwordResetMail(i: { resetUrl: string; expiresMinutes: number }): ComposedMail {
  const subject = 'Reset your Benchlight password';
  const { html, text } = frame({
    title: subject,
    bodyHtml: `<h1 style="margin:0 0 12px;font-size:22px">Reset your password</h1>
${paragraph('Someone, probably you, asked to reset the password of your Benchlight staff account. Choose a new one here; every session of the account ends when you do.')}
${button(i.resetUrl, 'Choose a new password')}
${paragraph(`The link works for ${i.expiresMinutes} minutes and once. If it was not you, ignore this e-mail: your password stays as it is.`)}`,
    bodyText: `Reset your password

Someone, probably you, asked to reset the password of your Benchlight staff account. Choose a new one here; every session of the account ends when you do:
${i.resetUrl}

The link works for ${i.expiresMinutes} minutes and once. If it was not you, ignore this e-mail: your password stays as it is.`,
    why: 'You get this because a password reset was asked for this staff account.',
  });
  return { subject, html, text };
}
