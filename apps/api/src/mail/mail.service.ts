import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import nodemailer, { type Transporter } from 'nodemailer';
import { mailConfig } from '../config/mail.config';
import { MailNotSentException } from './mail-not-sent.exception';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends Friable's e-mails over SMTP (the local sink in development and tests, a real relay in production). */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private readonly transport: Transporter;

  constructor(@Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>) {
    this.transport = nodemailer.createTransport({
      host: config.smtpHost,
      port: config.smtpPort,
      secure: false,
      // The loopback sink offers no TLS; a production relay that offers STARTTLS still gets it.
      ignoreTLS: config.smtpHost === '127.0.0.1' || config.smtpHost === 'localhost',
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
    });
  }

  /** Sends one message; throws MailNotSentException (503) when the SMTP server refuses or cannot be reached. */
  async send(mail: OutgoingMail): Promise<void> {
    try {
      await this.transport.sendMail({ from: this.config.from, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html });
    } catch (error) {
      // The message body holds links with secrets; log only where it was going and why it failed.
      this.logger.error(`could not send "${mail.subject}" to ${mail.to}: ${error instanceof Error ? error.message : String(error)}`);
      throw new MailNotSentException(mail.to);
    }
  }

  /** Sends a notice whose cause is already committed: a failure is logged, not thrown; answers whether it went. */
  async sendOrLog(mail: OutgoingMail): Promise<boolean> {
    try {
      await this.send(mail);
      return true;
    } catch {
      // send() has logged where it was going and why it failed.
      return false;
    }
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
