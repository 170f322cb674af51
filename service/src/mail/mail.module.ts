import { Global, Module } from '@nestjs/common';
import { MailController } from './mail.controller.js';
import { MailRepository } from './mail.repository.js';
import { MailService } from './mail.service.js';
import { ReviewNoticesService } from './review-notices.service.js';

/** E-mail notices: sending (SMTP or the built-in catcher), review notices, the admin list. */
@Global()
@Module({ controllers: [MailController], providers: [MailService, MailRepository, ReviewNoticesService], exports: [MailService, ReviewNoticesService] })
export class MailModule {}
