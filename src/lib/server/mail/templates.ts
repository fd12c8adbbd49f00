// The mail bodies in templates/, bundled into the build so the server needs no working directory.
import emailConfirm from '../../../../templates/mail-email-confirm.txt?raw';
import invite from '../../../../templates/mail-invite.txt?raw';
import passwordChanged from '../../../../templates/mail-password-changed.txt?raw';
import passwordReset from '../../../../templates/mail-password-reset.txt?raw';
import signUpExisting from '../../../../templates/mail-signup-existing.txt?raw';

export const mailTemplates = { emailConfirm, invite, passwordChanged, passwordReset, signUpExisting } as const;
export type MailTemplateName = keyof typeof mailTemplates;
