import { Check, Entity, Property } from '@mikro-orm/core';
import type { CertificateType } from '../files/file-type';
import { BaseEntity } from '../database/base.entity';

/**
 * An uploaded calibration certificate, kept in the database beside its record so that backups
 * hold both. Permanent, like the calibration that cites it.
 */
@Entity({ tableName: 'calibration_certificate' })
@Check({
  name: 'calibration_certificate_type_check',
  expression: `content_type in ('application/pdf', 'image/png', 'image/jpeg') and size_bytes > 0`,
})
export class CalibrationCertificate extends BaseEntity {
  @Property({ type: 'text' })
  filename!: string;

  @Property({ type: 'text' })
  contentType!: CertificateType;

  @Property({ type: 'integer' })
  sizeBytes!: number;

  /** Hex SHA-256 of the content, to show the file is the one uploaded. */
  @Property({ type: 'text' })
  sha256!: string;

  @Property({ type: 'blob', lazy: true })
  content!: Buffer;
}
