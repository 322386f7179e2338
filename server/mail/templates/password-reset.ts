import { mailLayout } from './layout';

export type PasswordResetMailData = {
  name: string;
  email: string;
  /** The page that sets the new password, its one-time token in the path. */
  url: string;
  lifetimeMinutes: number;
};

/** The link to choose a new password, to the account's own address only. */
export function passwordResetMail(d: PasswordResetMailData) {
  return {
    subject: 'Choose a new password for Saggar',
    ...mailLayout({
      heading: 'Choose a new password',
      paragraphs: [
        `Hello ${d.name},`,
        `Someone asked to choose a new password for the Saggar account ${d.email}. If that was you, the button below opens a page where you can choose it.`,
        `The link works once, for ${d.lifetimeMinutes} minutes. After that, ask for a new one from the sign-in page (“Forgot password?”).`,
      ],
      action: { label: 'Choose a new password', url: d.url },
      footer: `If you did not ask for this, you can ignore this e-mail: your password stays as it is. Sent by Saggar to ${d.email}.`,
    }),
  };
}
