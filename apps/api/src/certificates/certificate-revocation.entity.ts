import { Entity, OneToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Certificate } from './certificate.entity';

/** The withdrawal of a certificate, with the reason; permanent like the certificate. */
@Entity({ tableName: 'certificate_revocation' })
export class CertificateRevocation extends BaseEntity {
  @OneToOne(() => Certificate, { owner: true })
  certificate!: Certificate;

  @Property({ type: 'text' })
  reason!: string;

  @Property({ type: 'uuid', nullable: true })
  revokedById: string | null = null;

  @Property({ type: 'text' })
  revokedByName!: string;
}
