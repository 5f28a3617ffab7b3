import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import { startEmbeddedMaildev, type EmbeddedMaildev } from './embedded-maildev.js';
import { loadMailSettings, type MailSettings } from './mail-settings.js';

export interface MailMessage {
  to: string[];
  subject: string;
  text: string;
}

/** Sends one message over SMTP (nodemailer). Throws when the server is unreachable. */
@Injectable()
export class Mailer implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('Mailer');
  readonly settings: MailSettings = loadMailSettings();
  private transport!: Transporter;
  private maildev?: EmbeddedMaildev;

  async onModuleInit(): Promise<void> {
    const s = this.settings;
    if (s.MAIL_EMBEDDED) {
      this.maildev = await startEmbeddedMaildev(s.SMTP_PORT, s.MAILDEV_WEB_PORT);
      this.logger.log(
        `mail inbox (maildev): ${this.maildev.inboxUrl}  (SMTP 127.0.0.1:${s.SMTP_PORT})`,
      );
    }
    this.transport = nodemailer.createTransport({
      host: s.SMTP_HOST,
      port: s.SMTP_PORT,
      secure: false,
      ignoreTLS: true,
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 10000,
    });
  }

  async onModuleDestroy(): Promise<void> {
    this.transport?.close();
    await this.maildev?.stop();
  }

  async send(message: MailMessage): Promise<void> {
    await this.transport.sendMail({
      from: this.settings.MAIL_FROM,
      to: message.to,
      subject: message.subject,
      text: message.text,
    });
  }
}
