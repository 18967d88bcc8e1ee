import { Controller, Get, Header, Param } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Verification } from '@evenset/contracts';
import { Public } from '../common/auth/access.decorators';
import { VerificationCodeDto } from './certificates.dto';
import { CertificatesService } from './certificates.service';

/** The public check behind the certificate's QR code: no sign-in, read only. */
@ApiTags('certificates')
@Controller('verify')
export class VerifyController {
  constructor(private readonly certificates: CertificatesService) {}

  @Get(':code')
  @Public()
  @Header('Cache-Control', 'no-store')
  verify(@Param() { code }: VerificationCodeDto): Promise<Verification> {
    return this.certificates.verify(code);
  }
}
