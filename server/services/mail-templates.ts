/** The texts of the mail the server sends. */
import type { MailMessage } from './mailer';

export function passwordResetMail(to: string, link: string, minutes: number): MailMessage {
  return {
    to,
    subject: 'Reset your Panelpoint password',
    text: `Someone asked to reset the password of your Panelpoint account.\n\nTo choose a new password, open this link within ${minutes} minutes:\n${link}\n\nIf it was not you, ignore this message: your password stays as it is.\n`,
  };
}

export function invitationMail(to: string, link: string, projectName: string, inviter: string, role: string, days: number): MailMessage {
  return {
    to,
    subject: `${inviter} invites you to ${projectName} on Panelpoint`,
    text: `${inviter} invites you to join the project "${projectName}" on Panelpoint as ${role}.\n\nTo accept, open this link within ${days} days:\n${link}\n`,
  };
}
