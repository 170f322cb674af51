import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** An e-mail notice as the admin area lists it. */
export class MailMessageDto {
  @ApiProperty() id: string;
  @ApiProperty({ description: 'When the notice was written' }) createdAt: string;
  @ApiPropertyOptional({ type: String, nullable: true, description: 'When the SMTP server accepted it' }) sentAt: string | null;
  @ApiProperty({ enum: ['pending', 'sent', 'failed'] }) status: 'pending' | 'sent' | 'failed';
  @ApiPropertyOptional({ type: String, nullable: true, description: 'What the SMTP server or the connection said when it failed' }) error: string | null;
  @ApiProperty({ example: 'Rosa Reviewer <reviewer@poreline.demo>' }) to: string;
  @ApiProperty() subject: string;
  @ApiProperty({ example: 'interpretation.submitted' }) event: string;
  @ApiPropertyOptional({ type: String, nullable: true }) assetName: string | null;
  @ApiProperty({ description: 'Whether the built-in catcher received it (no SMTP_URL set: not delivered)' }) caught: boolean;
}

/** One notice with its text and, when the catcher received it, the raw message. */
export class MailMessageDetailDto extends MailMessageDto {
  @ApiProperty() body: string;
  @ApiPropertyOptional({ type: String, nullable: true, description: 'The message as the catcher received it (headers and body)' }) raw: string | null;
}

/** GET /api/admin/mail: where mail goes, and the newest notices. */
export class MailListDto {
  @ApiProperty({ enum: ['smtp', 'catcher'], description: 'smtp: sent to SMTP_URL; catcher: kept here, not delivered' }) mode: 'smtp' | 'catcher';
  @ApiProperty({ type: [MailMessageDto] }) messages: MailMessageDto[];
}
