import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { PartStatusService } from '../lots/part-status';
import { MailModule } from '../mail/mail.module';
import { CertificateRevocation } from './certificate-revocation.entity';
import { CertificateSigner } from './certificate-signer';
import { Certificate } from './certificate.entity';
import { CertificatesController, SetCertificatesController } from './certificates.controller';
import { CertificatesService } from './certificates.service';
import { VerifyController } from './verify.controller';

@Module({
  imports: [MikroOrmModule.forFeature([Certificate, CertificateRevocation]), InspectionsModule, MailModule],
  controllers: [CertificatesController, SetCertificatesController, VerifyController],
  providers: [CertificatesService, CertificateSigner, PartStatusService],
  exports: [CertificatesService],
})
export class CertificatesModule {}
