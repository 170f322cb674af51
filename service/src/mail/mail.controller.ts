import { BadRequestException, Controller, Get, NotFoundException, Param, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { MailMessage } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { isUuid } from '../common/ids.js';
import { MailListDto, MailMessageDetailDto, MailMessageDto } from './dto/mail-message.dto.js';
import { MailRepository } from './mail.repository.js';
import { MailService } from './mail.service.js';

function toDto(m: MailMessage, assetName: string | null): MailMessageDto {
  return {
    id: m.id,
    createdAt: m.createdAt.toISOString(),
    sentAt: m.sentAt?.toISOString() ?? null,
    status: m.status,
    error: m.error,
    to: m.toAddress,
    subject: m.subject,
    event: m.event,
    assetName,
    caught: m.caught !== null,
  };
}

/** The e-mail notices sent to the organisation's users (global admins only). */
@ApiTags('mail')
@ApiBearerAuth()
@Controller('admin/mail')
export class MailController {
  constructor(
    private readonly mail: MailService,
    private readonly repo: MailRepository,
  ) {}

  @Roles('admin')
  @Get()
  async list(@CurrentUser() user: AuthUser, @Query('limit') limit?: string): Promise<MailListDto> {
    // Read as text: the global pipe would turn "lots" into NaN, which a database limit ignores.
    if (limit !== undefined && !/^\d{1,9}$/.test(limit)) throw new BadRequestException('limit must be a whole number (1 to 1000)');
    const rows = await this.repo.listForOrganisation(user.organisationId, Math.min(Math.max(Number(limit ?? 200), 1), 1000));
    return { mode: this.mail.mode, messages: rows.map((r) => toDto(r.message, r.assetName)) };
  }

  @Roles('admin')
  @Get(':id')
  async get(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<MailMessageDetailDto> {
    const row = isUuid(id) ? await this.repo.findForOrganisation(user.organisationId, id) : undefined;
    if (!row) throw new NotFoundException('No such notice.');
    return { ...toDto(row.message, row.assetName), body: row.message.body, raw: row.message.caught };
  }
}
