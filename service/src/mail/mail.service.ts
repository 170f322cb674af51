import { Inject, Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import type { MailMessage, NewMailMessage } from '@poreline/schema';
import { randomUUID } from 'node:crypto';
import nodemailer, { type Transporter } from 'nodemailer';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { MailCatcher, messageIdOf } from './mail-catcher.js';
import { MailRepository } from './mail.repository.js';

/** A notice to send: everything but the bookkeeping columns. */
export type OutgoingMail = Omit<NewMailMessage, 'id' | 'messageId' | 'status' | 'error' | 'caught' | 'createdAt' | 'sentAt'>;

/**
 * Sends e-mail notices through nodemailer: to SMTP_URL when set, else to the built-in catcher
 * (mail-catcher.ts). Every notice is stored first (pending), then marked sent or failed with
 * the server's error; a failed send never fails the request that caused it.
 */
@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private transport!: Transporter;
  private catcher: MailCatcher | null = null;
  private readonly inFlight = new Set<Promise<void>>();

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly mail: MailRepository,
  ) {}

  /** 'smtp' when SMTP_URL is set, else 'catcher'. */
  get mode(): 'smtp' | 'catcher' {
    return this.config.smtpUrl ? 'smtp' : 'catcher';
  }

  async onModuleInit(): Promise<void> {
    if (this.config.smtpUrl) {
      // Short timeouts: an unreachable server marks the notice failed within seconds instead of
      // holding it (and shutdown, which waits for sends) for nodemailer's default two minutes.
      this.transport = nodemailer.createTransport({ url: this.config.smtpUrl, connectionTimeout: 15_000, greetingTimeout: 15_000, socketTimeout: 30_000 });
      return;
    }
    this.catcher = await MailCatcher.start(async (raw) => {
      const id = messageIdOf(raw);
      if (!id || !(await this.mail.keepCaught(id, raw))) this.logger.warn(`caught a message that is not a stored notice (Message-ID ${id ?? 'missing'})`);
    });
    this.transport = nodemailer.createTransport({ host: '127.0.0.1', port: this.catcher.port, secure: false, ignoreTLS: true });
  }

  /** Stores the notices and sends them in the background (see {@link settled}). */
  async send(mails: OutgoingMail[]): Promise<MailMessage[]> {
    const domain = /@([^>\s]+)/.exec(this.config.mailFrom)?.[1] ?? 'poreline.localhost';
    const rows = await this.mail.insert(mails.map((m) => ({ ...m, messageId: `${randomUUID()}@${domain}` })));
    for (const row of rows) {
      const p = this.deliver(row).finally(() => this.inFlight.delete(p));
      this.inFlight.add(p);
    }
    return rows;
  }

  /** Resolves when every notice sent so far is marked sent or failed. */
  async settled(): Promise<void> {
    while (this.inFlight.size > 0) await Promise.allSettled([...this.inFlight]);
  }

  async onModuleDestroy(): Promise<void> {
    await this.settled();
    this.transport?.close();
    await this.catcher?.close();
  }

  private async deliver(row: MailMessage): Promise<void> {
    try {
      await this.transport.sendMail({
        from: this.config.mailFrom,
        to: row.toAddress,
        subject: row.subject,
        text: row.body,
        messageId: `<${row.messageId}>`,
      });
      await this.mail.markSent(row.id);
    } catch (error) {
      const text = error instanceof Error ? error.message : String(error);
      this.logger.warn(`notice to ${row.toAddress} not sent: ${text}`);
      await this.mail.markFailed(row.id, text.slice(0, 2000)).catch(() => undefined);
    }
  }
}
