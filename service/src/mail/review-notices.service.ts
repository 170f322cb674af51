import { Inject, Injectable, Logger } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { MailRepository } from './mail.repository.js';
import { MailService } from './mail.service.js';
import { composeReviewNotice, mailbox, noticeEvent, type NoticeAction, type ReviewedItem } from './review-notice.js';

/** A review step that has been committed, as the notices need it. */
export interface ReviewStepTaken {
  assetId: string;
  action: NoticeAction;
  item: ReviewedItem;
  entity: 'interpretation' | 'reserves-case';
  entityId: string;
  /** Who took the step (never notified of their own step). */
  actorId: string;
  /** The item's author(s): who created and who submitted it. */
  authorIds: (string | null)[];
  comment: string | null;
  /** Path of the item in the app, from the root (`/assets/...`). */
  path: string;
}

/**
 * DESIGN, "Share": reviewers are told when something waits for them (every member holding
 * the reviewer role on the asset), authors when it is approved or returned.
 */
@Injectable()
export class ReviewNoticesService {
  private readonly logger = new Logger('ReviewNotices');

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly mail: MailService,
    private readonly repo: MailRepository,
  ) {}

  /** Stores and sends the notices of a committed step; a failure is logged, never thrown. */
  async stepTaken(step: ReviewStepTaken): Promise<void> {
    try {
      const recipients = step.action === 'submit' ? await this.repo.membersWithRole(step.assetId, ['reviewer']) : await this.repo.users([...new Set(step.authorIds.filter((id): id is string => !!id))]);
      const to = recipients.filter((r) => r.id !== step.actorId);
      if (to.length === 0) return;
      const [actor] = await this.repo.users([step.actorId]);
      const assetName = (await this.repo.assetName(step.assetId)) ?? 'the asset';
      const link = `${this.config.publicUrl}${step.path}`;
      await this.mail.send(
        to.map((r) => {
          const { subject, body } = composeReviewNotice({ action: step.action, item: step.item, assetName, actorName: actor?.name ?? 'A user', recipientName: r.name, comment: step.comment, link });
          return { assetId: step.assetId, toUserId: r.id, toAddress: mailbox(r.name, r.email), subject, body, event: noticeEvent(step.item, step.action), entity: step.entity, entityId: step.entityId };
        }),
      );
    } catch (error) {
      this.logger.warn(`notices for ${step.entity} ${step.entityId} (${step.action}) not stored: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
}
