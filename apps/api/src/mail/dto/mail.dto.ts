import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class MailMessageSummary {
  @ApiProperty() id: string;
  @ApiProperty() from: string;
  @ApiProperty() to: string;
  @ApiProperty() subject: string;
  @ApiProperty() receivedAt: string;
  @ApiProperty() attachmentCount: number;
}

export class MailAttachmentSummary {
  @ApiProperty() index: number;
  @ApiProperty() filename: string;
  @ApiProperty() contentType: string;
  @ApiProperty() size: number;
}

export class MailMessageDetail extends MailMessageSummary {
  @ApiProperty() text: string;
  @ApiPropertyOptional({ nullable: true, type: String }) html: string | null;
  @ApiProperty({ type: [MailAttachmentSummary] }) attachments: MailAttachmentSummary[];
}
