import { BullModule } from '@nestjs/bull';
import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MailAttachment } from './entities/mail-attachment.entity';
import { MailMessage } from './entities/mail-message.entity';
import { OutgoingMail } from './entities/outgoing-mail.entity';
import { MAIL_QUEUE } from './mail.constants';
import { MailController } from './mail.controller';
import { MailProcessor } from './mail.processor';
import { MailService } from './mail.service';
import { MailboxService } from './mailbox.service';

/** The queue's consumer runs where QUEUE_ROLE is `all` (default) or `worker`. */
const runsWorkers = (process.env.QUEUE_ROLE ?? 'all') !== 'api';

@Module({
  imports: [TypeOrmModule.forFeature([OutgoingMail, MailMessage, MailAttachment]), BullModule.registerQueue({ name: MAIL_QUEUE })],
  controllers: [MailController],
  providers: [MailService, MailboxService, ...(runsWorkers ? [MailProcessor] : [])],
  exports: [MailService],
})
export class MailModule {}
