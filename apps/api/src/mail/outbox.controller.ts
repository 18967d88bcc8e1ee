import { Controller, Get, HttpCode, Param, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type {
  CapturedMail,
  CapturedMailDetail,
  MailDelivery,
  OutboxMessage,
  Page,
  SessionUser,
} from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { MailService } from './mail.service';
import { AttachmentIndexDto, MessageIdDto, OutboxListQueryDto } from './outbox.dto';
import { OutboxService } from './outbox.service';

@ApiTags('outbox')
@Controller('outbox')
@Roles('admin')
export class OutboxController {
  constructor(
    private readonly outbox: OutboxService,
    private readonly mail: MailService,
  ) {}

  @Get('messages')
  messages(@Query() query: OutboxListQueryDto): Promise<Page<OutboxMessage>> {
    return this.outbox.messages(query);
  }

  @Post('messages/:id/retry')
  @HttpCode(200)
  retry(@CurrentUser() actor: SessionUser, @Param() { id }: MessageIdDto): Promise<MailDelivery> {
    return this.mail.retry(id, actor);
  }

  @Get('captured')
  captured(@Query() query: OutboxListQueryDto): Promise<Page<CapturedMail>> {
    return this.outbox.captured(query);
  }

  @Get('captured/:id')
  capturedDetail(@Param() { id }: MessageIdDto): Promise<CapturedMailDetail> {
    return this.outbox.capturedDetail(id);
  }

  @Get('captured/:id/attachments/:index')
  async attachment(@Param() { id, index }: AttachmentIndexDto): Promise<StreamableFile> {
    const file = await this.outbox.capturedAttachment(id, index);
    return new StreamableFile(file.content, {
      type: file.contentType,
      length: file.content.length,
      disposition: `attachment; filename="${file.filename.replace(/["\\\r\n]/g, '_')}"`,
    });
  }
}
