import type { EntityManager } from '@mikro-orm/postgresql';
import type { CorrectionImpact } from '@evenset/contracts';
import { SetMember } from '../sets/set-member.entity';
import { CertificateRevocation } from './certificate-revocation.entity';
import { Certificate } from './certificate.entity';

/**
 * The certificates whose facts would read differently once these parts' heights are recomputed:
 * every certificate of a set holding one of them, revoked ones marked as such.
 */
export async function certificatesOfParts(
  em: EntityManager,
  partIds: string[],
): Promise<CorrectionImpact['certificates']> {
  if (!partIds.length) return [];
  const members = await em.find(SetMember, { part: { $in: partIds } });
  const setIds = [...new Set(members.map((m) => m.set.id))];
  if (!setIds.length) return [];
  const certificates = await em.find(
    Certificate,
    { set: { $in: setIds } },
    { populate: ['set'], orderBy: { certificateNumber: 'asc' } },
  );
  const revoked = new Set(
    (await em.find(CertificateRevocation, { certificate: { $in: certificates.map((c) => c.id) } })).map(
      (r) => r.certificate.id,
    ),
  );
  return certificates.map((c) => ({
    id: c.id,
    certificateNumber: c.certificateNumber,
    setId: c.set.id,
    setNumber: c.set.setNumber,
    customerName: c.set.order.customer.name,
    revoked: revoked.has(c.id),
  }));
}
