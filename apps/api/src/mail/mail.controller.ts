import { Controller, Get, Param, ParseIntPipe, ParseUUIDPipe, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { AuthUser, CurrentUser } from '../common/current-user';
import { Roles } from '../common/roles';
import { MailMessageDetail, MailMessageSummary } from './dto/mail.dto';
import { MailboxService } from './mailbox.service';

@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail/messages')
@Roles('owner')
export class MailController {
  constructor(private readonly mailbox: MailboxService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<MailMessageSummary[]> {
    return this.mailbox.list(user.companyId);
  }

  @Get(':id')
  get(
    @CurrentUser() user: AuthUser,
    @Param('id', new ParseUUIDPipe({ errorHttpStatusCode: 404 })) id: string,
  ): Promise<MailMessageDetail> {
    return this.mailbox.get(user.companyId, id);
  }

  @Get(':id/attachments/:index')
  async attachment(
    @CurrentUser() user: AuthUser,
    @Param('id', new ParseUUIDPipe({ errorHttpStatusCode: 404 })) id: string,
    @Param('index', new ParseIntPipe({ errorHttpStatusCode: 404 })) index: number,
    @Res() res: Response,
  ): Promise<void> {
    const a = await this.mailbox.attachment(user.companyId, id, index);
    res.setHeader('Content-Type', a.contentType);
    res.setHeader('Content-Disposition', `attachment; filename="${a.filename.replace(/[^\w.\- ]/g, '_')}"`);
    res.send(a.content);
  }
}
