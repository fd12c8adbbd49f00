// Mail: templated messages over SMTP. (The dev mailbox reader, read-mailbox.ts, is imported only by the dev pages.)
export { sendMail, MailDeliveryError, DEFAULT_MAIL_FROM } from './send-mail';
export { renderMailTemplate, type RenderedMail } from './render-template';

export { appOrigin } from './app-origin';
export type { MailTemplateName } from './templates';
