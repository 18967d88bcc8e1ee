import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import {
  VERIFICATION_ALPHABET,
  VERIFICATION_CODE_LENGTH,
  type Certificate as CertificateView,
  type CertificateEmailed,
  type CertificateListQuery,
  type CertificateStatus,
  type Page,
  type PartStatus,
  type SessionUser,
  type Verification,
} from '@evenset/contracts';
import { randomInt } from 'node:crypto';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { listOptions } from '../common/list-query';
import { AppConfig } from '../config/app-config.service';
import { PartStatusService } from '../lots/part-status';
import { MailService } from '../mail/mail.service';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { MatchedSet } from '../sets/matched-set.entity';
import { SetMember } from '../sets/set-member.entity';
import { composeFacts, type MemberRecord } from './certificate-facts';
import { checkIntegrity } from './certificate-integrity';
import { renderCertificatePdf } from './certificate-pdf';
import { CertificateRevocation } from './certificate-revocation.entity';
import { CertificateSigner } from './certificate-signer';
import { Certificate } from './certificate.entity';
import { canonicalJson } from './canonical-json';
import {
  CertificateAlreadyRevokedException,
  CertificateRefusedException,
  UnknownVerificationCodeException,
} from './certificates.exception';

/** Why a part stops a certificate, in words. */
const STATUS_WORDS: Record<PartStatus, string> = {
  'not-inspected': 'not inspected',
  conforms: 'inspected but not released',
  'does-not-conform': 'not conforming',
  'guard-band': 'in the guard band and not released',
  held: 'held (its run drifted)',
  rework: 'sent to rework',
  scrap: 'scrapped',
  'use-as-is': 'accepted as is but not released',
  released: 'released but has no result',
};

export interface CertificatePdf {
  filename: string;
  content: Buffer;
}

@Injectable()
export class CertificatesService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly config: AppConfig,
    private readonly signer: CertificateSigner,
    private readonly partStatus: PartStatusService,
    private readonly mail: MailService,
  ) {}

  /**
   * Freezes the set's facts as they stand, signs them and stores the certificate. Refused when a
   * member is no longer released (held, reworked, scrapped, or re-inspected since its release).
   */
  async issue(actor: SessionUser, setId: string): Promise<CertificateView> {
    const set = await this.em.findOne(MatchedSet, { id: setId }, { populate: ['replacesSet'] });
    if (!set) throw new NotFoundException('This set');
    const members = await this.membersOf(set);
    const replaced = set.replacesSet
      ? await this.em.find(SetMember, { set: set.replacesSet }, { populate: ['part'], orderBy: { position: 'asc' } })
      : null;

    // A clash on the number or the code (two issues at the same moment) is retried once.
    for (let attempt = 0; ; attempt += 1) {
      const issuedAt = new Date();
      const certificateNumber = await this.nextNumber(issuedAt.getUTCFullYear());
      const verificationCode = newVerificationCode();
      const facts = composeFacts({
        certificateNumber,
        verificationCode,
        verifyUrl: this.verifyUrl(verificationCode),
        issuedAt,
        issuer: actor.displayName,
        shop: { name: this.config.get('SHOP_NAME'), address: this.config.get('SHOP_ADDRESS') },
        set,
        members,
        replaced,
      });
      const payload = canonicalJson(facts);
      const { signature, keyId } = this.signer.sign(payload);
      try {
        const id = await this.em.fork().transactional(async (tx) => {
          const certificate = tx.create(Certificate, {
            certificateNumber,
            verificationCode,
            set: tx.getReference(MatchedSet, set.id),
            payload,
            signature,
            keyId,
            issuedById: actor.id,
            issuedByName: actor.displayName,
            createdAt: issuedAt,
          });
          await tx.flush();
          await this.audit.recordMany(tx, actor, [
            {
              action: 'certificate.issue',
              subjectType: 'certificate',
              subjectId: certificate.id,
              after: {
                certificateNumber,
                setNumber: set.setNumber,
                keyId,
                serials: facts.members.map((m) => m.serial),
              },
            },
          ]);
          return certificate.id;
        });
        return this.detail(id);
      } catch (error) {
        if (error instanceof UniqueConstraintViolationException && attempt === 0) continue;
        throw error;
      }
    }
  }

  async list(query: CertificateListQuery): Promise<Page<CertificateView>> {
    const where: FilterQuery<Certificate> = {
      $and: [
        searchOf(query.q?.trim()),
        query.setId ? { set: query.setId } : {},
        query.customerId ? { set: { order: { customer: query.customerId } } } : {},
      ],
    };
    const [rows, total] = await this.em.findAndCount(Certificate, where, {
      populate: ['set'],
      ...listOptions(query, ['certificateNumber', 'createdAt'], 'createdAt'),
    });
    return { items: await this.views(rows), total };
  }

  async detail(id: string): Promise<CertificateView> {
    const [view] = await this.views([await this.get(id)]);
    return view!;
  }

  /** The PDF, drawn from the stored (signed) facts; refused when they can no longer be read. */
  async pdf(id: string): Promise<CertificatePdf> {
    const row = await this.get(id);
    const { facts } = checkIntegrity(row, this.signer);
    if (!facts)
      throw new CertificateRefusedException(
        `The stored facts of certificate ${row.certificateNumber} cannot be read: the record was altered.`,
      );
    return { filename: `${row.certificateNumber}.pdf`, content: await renderCertificatePdf(facts) };
  }

  async revoke(actor: SessionUser, id: string, reason: string): Promise<CertificateView> {
    const row = await this.get(id);
    const existing = await this.em.findOne(CertificateRevocation, { certificate: row });
    if (existing) throw alreadyRevoked(row, existing);
    const revocation = this.em.create(CertificateRevocation, {
      certificate: row,
      reason,
      revokedById: actor.id,
      revokedByName: actor.displayName,
      createdAt: new Date(),
    });
    this.audit.record(actor, {
      action: 'certificate.revoke',
      subjectType: 'certificate',
      subjectId: row.id,
      after: { certificateNumber: row.certificateNumber },
      reason,
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (!(error instanceof UniqueConstraintViolationException)) throw error;
      // Someone else revoked it at the same moment: theirs stands.
      const theirs = await this.em.fork().findOneOrFail(CertificateRevocation, { certificate: row.id });
      throw alreadyRevoked(row, theirs);
    }
    return (await this.views([row], [revocation]))[0]!;
  }

  /** Sends the PDF to `recipient` or the customer's contact; the Outbox keeps the message and why it failed. */
  async email(actor: SessionUser, id: string, recipient: string | undefined): Promise<CertificateEmailed> {
    const row = await this.get(id);
    const [view] = await this.views([row]);
    if (view!.status !== 'genuine')
      throw new CertificateRefusedException(
        view!.status === 'revoked'
          ? `Certificate ${row.certificateNumber} is revoked; it is not sent.`
          : `Certificate ${row.certificateNumber} no longer matches its signature; it is not sent. Tell an engineer.`,
      );
    const { content, filename } = await this.pdf(id);
    const to = recipient ?? row.set.order.customer.contactEmail;
    const facts = checkIntegrity(row, this.signer).facts!;
    const delivery = await this.mail.send(
      {
        kind: 'certificate',
        recipient: to,
        subject: `Certificate of conformance ${row.certificateNumber} — ${facts.part.partNumber} set ${facts.set.setNumber}`,
        body: [
          `Hello ${facts.customer.name},`,
          '',
          `Attached is certificate of conformance ${row.certificateNumber} for ${facts.part.partNumber} set ${facts.set.setNumber}, order ${facts.customer.orderReference}.`,
          `You can check that it is genuine at ${facts.verifyUrl} (verification code ${row.verificationCode}).`,
          '',
          facts.shop.name,
          facts.shop.address,
        ].join('\n'),
        subjectId: row.id,
        attachments: [{ filename, contentType: 'application/pdf', content }],
      },
      actor,
    );
    return { ...delivery, recipient: to };
  }

  /** The public check: genuine, revoked (with why and when) or altered; altered wins over revoked. */
  async verify(code: string): Promise<Verification> {
    const row = await this.em.findOne(Certificate, { verificationCode: code }, { populate: ['set'] });
    if (!row) throw new UnknownVerificationCodeException();
    const revocation = await this.em.findOne(CertificateRevocation, { certificate: row });
    const { intact, facts } = checkIntegrity(row, this.signer);
    return {
      status: statusOf(intact, revocation),
      signatureValid: intact,
      facts,
      revocation: revocation ? { reason: revocation.reason, at: revocation.createdAt.toISOString() } : null,
      checkedAt: new Date().toISOString(),
    };
  }

  private async membersOf(set: MatchedSet): Promise<MemberRecord[]> {
    const members = await this.em.find(
      SetMember,
      { set },
      { populate: ['part', 'part.lot', 'part.lot.spec'], orderBy: { position: 'asc' } },
    );
    if (!members.length) throw new CertificateRefusedException(`Set ${set.setNumber} has no parts.`);
    const states = await this.partStatus.states(members.map((m) => m.part));
    const problems = states.filter((s) => s.status !== 'released' || !s.inspection || !s.result);
    if (problems.length)
      throw new CertificateRefusedException(
        `No certificate for set ${set.setNumber}: ${problems.map((s) => `${s.part.serial} is ${STATUS_WORDS[s.status]}`).join(', ')}. ` +
          'Every part must be released, and not inspected again since.',
      );
    const calibrations = await this.em.find(MasterCalibration, {
      id: { $in: states.map((s) => s.result!.masterCalibration.id) },
    });
    const byId = new Map(calibrations.map((c) => [c.id, c]));
    return members.map((member, i) => ({
      member,
      inspection: states[i]!.inspection!,
      result: states[i]!.result!,
      calibration: byId.get(states[i]!.result!.masterCalibration.id)!,
    }));
  }

  /** The next EC-YYYY-NNNN of the year; the unique constraint settles a race. */
  private async nextNumber(year: number): Promise<string> {
    const prefix = `EC-${year}-`;
    const [row] = await this.em
      .getConnection()
      .execute<{ last: number | null }[]>(
        `select max(substring(certificate_number from ${prefix.length + 1})::int) as last from certificate where certificate_number ~ ?`,
        [`^EC-${year}-[0-9]+$`],
      );
    return `${prefix}${String((row?.last ?? 0) + 1).padStart(4, '0')}`;
  }

  private verifyUrl(code: string): string {
    const base = this.config.get('PUBLIC_URL') ?? `http://${this.config.get('HOST')}:${this.config.get('PORT')}`;
    return `${base.replace(/\/+$/, '')}/verify/${code}`;
  }

  private async get(id: string): Promise<Certificate> {
    const row = await this.em.findOne(Certificate, { id }, { populate: ['set'] });
    if (!row) throw new NotFoundException('This certificate');
    return row;
  }

  private async views(rows: Certificate[], known: CertificateRevocation[] = []): Promise<CertificateView[]> {
    const revocations = new Map(
      [...(await this.em.find(CertificateRevocation, { certificate: { $in: rows.map((r) => r.id) } })), ...known].map(
        (r) => [r.certificate.id, r],
      ),
    );
    return rows.map((row) => {
      const revocation = revocations.get(row.id) ?? null;
      const { order } = row.set;
      return {
        id: row.id,
        certificateNumber: row.certificateNumber,
        verificationCode: row.verificationCode,
        setId: row.set.id,
        setNumber: row.set.setNumber,
        customerId: order.customer.id,
        customerName: order.customer.name,
        customerEmail: order.customer.contactEmail,
        orderReference: order.reference,
        partNumber: row.set.partNumber,
        status: statusOf(checkIntegrity(row, this.signer).intact, revocation),
        revocation: revocation
          ? { reason: revocation.reason, at: revocation.createdAt.toISOString(), by: revocation.revokedByName }
          : null,
        issuedBy: row.issuedByName,
        createdAt: row.createdAt.toISOString(),
      };
    });
  }
}

/** Number, code, set number, order reference or customer name contains the text (any case). */
function searchOf(q: string | undefined): FilterQuery<Certificate> {
  if (!q) return {};
  const like = { $ilike: `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` };
  return {
    $or: [
      { certificateNumber: like },
      { verificationCode: like },
      { set: { setNumber: like } },
      { set: { order: { reference: like } } },
      { set: { order: { customer: { name: like } } } },
    ],
  };
}

function statusOf(intact: boolean, revocation: CertificateRevocation | null): CertificateStatus {
  if (!intact) return 'altered';
  return revocation ? 'revoked' : 'genuine';
}

function alreadyRevoked(row: Certificate, revocation: CertificateRevocation): CertificateAlreadyRevokedException {
  return new CertificateAlreadyRevokedException(
    row.certificateNumber,
    revocation.createdAt.toISOString().slice(0, 10),
    revocation.revokedByName,
    revocation.reason,
  );
}

/** Random code from the unambiguous alphabet (25 symbols, 12 places: about 55 bits). */
function newVerificationCode(): string {
  let code = '';
  for (let i = 0; i < VERIFICATION_CODE_LENGTH; i += 1)
    code += VERIFICATION_ALPHABET[randomInt(VERIFICATION_ALPHABET.length)];
  return code;
}
