import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { MatchedSet } from '../sets/matched-set.entity';

/**
 * A certificate of conformance for a set. Its facts are frozen at issue as canonical JSON
 * (`payload`) and signed with the shop's Ed25519 key; the row is permanent, and any change made
 * to it behind the product's back shows as a signature that no longer holds.
 */
@Entity({ tableName: 'certificate' })
export class Certificate extends BaseEntity {
  /** e.g. EC-2026-0012. */
  @Property({ type: 'text' })
  @Unique()
  certificateNumber!: string;

  /** Short code printed on the certificate and in its QR link: /verify/<code>. */
  @Property({ type: 'text' })
  @Unique()
  verificationCode!: string;

  @ManyToOne(() => MatchedSet)
  @Index()
  set!: MatchedSet;

  /** The certificate's facts as canonical JSON: exactly the bytes that were signed. */
  @Property({ type: 'text' })
  payload!: string;

  /** Ed25519 signature of `payload`, base64. */
  @Property({ type: 'text' })
  signature!: string;

  /** Which public key verifies it (SHA-256 fingerprint of the key, hex). */
  @Property({ type: 'text' })
  keyId!: string;

  @Property({ type: 'uuid', nullable: true })
  issuedById: string | null = null;

  @Property({ type: 'text' })
  issuedByName!: string;
}
