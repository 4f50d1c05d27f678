import { ServiceUnavailableException } from '@nestjs/common';

/** The SMTP server refused the message or could not be reached; nothing was saved. */
export class MailNotSentException extends ServiceUnavailableException {
  constructor(to: string) {
    super(`The e-mail to ${to} could not be sent, so nothing was changed. Check the mail settings (SMTP_HOST, SMTP_PORT) and try again.`);
  }
}
