/** GET /api/admin/mail rows (service: mail/dto/mail-message.dto.ts). */
export interface MailNotice {
  id: string;
  createdAt: string;
  sentAt: string | null;
  status: 'pending' | 'sent' | 'failed';
  error: string | null;
  to: string;
  subject: string;
  event: string;
  assetName: string | null;
  caught: boolean;
}

export interface MailNoticeDetail extends MailNotice {
  body: string;
  raw: string | null;
}

export interface MailList {
  /** smtp: sent to the server in SMTP_URL; catcher: kept in the app, not delivered. */
  mode: 'smtp' | 'catcher';
  messages: MailNotice[];
}
