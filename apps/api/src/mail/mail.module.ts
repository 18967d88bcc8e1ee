import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { CapturedMail } from './captured-mail.entity';
import { MailAttachment } from './mail-attachment.entity';
import { MailAttempt } from './mail-attempt.entity';
import { MailMessage } from './mail-message.entity';
import { DueDigestService } from './due-digest.service';
import { MailService } from './mail.service';
import { OutboxController } from './outbox.controller';
import { OutboxService } from './outbox.service';

@Module({
  imports: [MikroOrmModule.forFeature([MailMessage, MailAttachment, MailAttempt, CapturedMail])],
  controllers: [OutboxController],
  providers: [MailService, OutboxService, DueDigestService],
  exports: [MailService],
})
export class MailModule {}
