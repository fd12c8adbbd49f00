// The mail bodies in templates/, bundled into the build so the server needs no working directory.
import invite from '../../../../templates/mail-invite.txt?raw';
import passwordReset from '../../../../templates/mail-password-reset.txt?raw';

export const mailTemplates = { invite, passwordReset } as const;
export type MailTemplateName = keyof typeof mailTemplates;
