import { ConfigService } from '@nestjs/config';
import type { EntityManager } from '@mikro-orm/postgresql';
import { AuditService } from '../../audit/audit.service';
import { CertificateSigner } from '../../certificates/certificate-signer';
import { CertificatesService } from '../../certificates/certificates.service';
import { AppConfig } from '../../config/app-config.service';
import { validateEnv } from '../../config/env.schema';
import { Customer } from '../../customers/customer.entity';
import { CustomersService } from '../../customers/customers.service';
import { InspectionsService } from '../../inspections/inspections.service';
import { PartStatusService } from '../../lots/part-status';
import { Part } from '../../lots/part.entity';
import { MailService } from '../../mail/mail.service';
import { FreeStock } from '../../sets/free-stock';
import { InterchangeService } from '../../sets/interchange.service';
import { SetsService } from '../../sets/sets.service';
import { User } from '../../users/user.entity';
import { asActor } from './demo-lots';

/** Invented customers of the demo; the .example domains are reserved for examples. */
const CUSTOMERS = [
  {
    name: 'Marrow Creek Tooling',
    contactEmail: 'buyer@marrowcreek.example',
    notes: 'Buys RB-40 risers in sets of four.',
  },
  { name: 'Fenbridge Fixture Works', contactEmail: 'purchasing@fenbridge.example', notes: 'PP-6 parallels in pairs.' },
  { name: 'Alder Valley Machining', contactEmail: 'orders@aldervalley.example', notes: null },
];

/** Sets sold last year, each with its certificate (lots L-2025-118 and L-2025-131 of demo-lots.ts). */
const SOLD = [
  {
    customer: 'Marrow Creek Tooling',
    order: 'MC-4471',
    partNumber: 'RB-40',
    serials: ['RB40-1181', 'RB40-1182', 'RB40-1183', 'RB40-1184'],
  },
  { customer: 'Fenbridge Fixture Works', order: 'FB-2025-118', partNumber: 'PP-6', serials: ['PP6-1311', 'PP6-1312'] },
];

/**
 * Customers, sold sets and their certificates, through the API's own services. Afterwards: a
 * replacement for the Marrow Creek set has fitting RB-40 parts in stock; none of this year's PP-6
 * parallels (L-2026-044, ground high) matches the Fenbridge pair, so a replacement needs grinding
 * and Lot review flags them as outside the interchange window. Runs once.
 */
export async function seedDemoSales(em: EntityManager): Promise<void> {
  if (await em.count(Customer, {})) return;
  const audit = new AuditService(em);
  const states = new PartStatusService(em, new InspectionsService(em, audit));
  const interchange = new InterchangeService(em);
  const sets = new SetsService(em, audit, interchange, new FreeStock(em, states));
  const config = new AppConfig(new ConfigService(validateEnv(process.env)));
  const certificates = new CertificatesService(
    em,
    audit,
    config,
    new CertificateSigner(config),
    states,
    new MailService(em, audit, config),
  );
  const sales = asActor(await em.findOneOrFail(User, { email: 'sales@kestrel.example' }));
  const customers = new CustomersService(em, audit);
  const ids = new Map<string, string>();
  for (const customer of CUSTOMERS)
    ids.set(customer.name, (await customers.create(sales, { ...customer, notes: customer.notes ?? undefined })).id);

  for (const sold of SOLD) {
    const parts = await em.find(Part, { partNumber: sold.partNumber, serial: { $in: sold.serials } });
    const { items } = await sets.allocate(sales, {
      partNumber: sold.partNumber,
      customerId: ids.get(sold.customer)!,
      orderReference: sold.order,
      sets: [{ partIds: parts.map((p) => p.id) }],
    });
    for (const set of items) await certificates.issue(sales, set.id);
  }
}
