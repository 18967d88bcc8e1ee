import { Body, Controller, Get, HttpCode, Param, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Certificate, CertificateEmailed, Page, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import {
  CertificateIdDto,
  CertificateListQueryDto,
  EmailCertificateDto,
  RevokeCertificateDto,
  SetIdDto,
} from './certificates.dto';
import { CertificatesService } from './certificates.service';

const READERS = ['sales', 'service', 'engineer', 'admin'] as const;

@ApiTags('certificates')
@Controller('certificates')
@Roles(...READERS)
export class CertificatesController {
  constructor(private readonly certificates: CertificatesService) {}

  /** `?setId=`, `?customerId=`, `?q=` (number, verification code, set number, order or customer). */
  @Get()
  list(@Query() query: CertificateListQueryDto): Promise<Page<Certificate>> {
    return this.certificates.list(query);
  }

  @Get(':id')
  detail(@Param() { id }: CertificateIdDto): Promise<Certificate> {
    return this.certificates.detail(id);
  }

  @Get(':id/pdf')
  async pdf(@Param() { id }: CertificateIdDto): Promise<StreamableFile> {
    const file = await this.certificates.pdf(id);
    return new StreamableFile(file.content, {
      type: 'application/pdf',
      length: file.content.length,
      disposition: `attachment; filename="${file.filename}"`,
    });
  }

  @Post(':id/revocation')
  @Roles('engineer', 'admin')
  @HttpCode(200)
  revoke(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: CertificateIdDto,
    @Body() body: RevokeCertificateDto,
  ): Promise<Certificate> {
    return this.certificates.revoke(actor, id, body.reason);
  }

  /** Answers 200 whether or not the mail server took it: the answer says which, and why. */
  @Post(':id/email')
  @Roles('sales', 'admin')
  @HttpCode(200)
  email(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: CertificateIdDto,
    @Body() body: EmailCertificateDto,
  ): Promise<CertificateEmailed> {
    return this.certificates.email(actor, id, body.recipient);
  }
}

@ApiTags('certificates')
@Controller('sets')
export class SetCertificatesController {
  constructor(private readonly certificates: CertificatesService) {}

  @Post(':setId/certificates')
  @Roles('sales', 'admin')
  issue(@CurrentUser() actor: SessionUser, @Param() { setId }: SetIdDto): Promise<Certificate> {
    return this.certificates.issue(actor, setId);
  }
}
