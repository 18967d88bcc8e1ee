import { Check, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { GrindRequest } from './grind-request.entity';

export type GrindRequestStatus = 'open' | 'ground' | 're-inspected';

/** One step of a grind request's progress (open → ground → re-inspected); the newest is its status. */
@Entity({ tableName: 'grind_request_step' })
@Check({ name: 'grind_request_step_status_check', expression: `status in ('open', 'ground', 're-inspected')` })
@Index({ properties: ['request', 'createdAt'] })
export class GrindRequestStep extends BaseEntity {
  @ManyToOne(() => GrindRequest)
  request!: GrindRequest;

  @Property({ type: 'text' })
  status!: GrindRequestStatus;

  @Property({ type: 'text', nullable: true })
  note: string | null = null;

  /** For re-inspected: the Bench inspection that measured the ground part. */
  @Property({ type: 'uuid', nullable: true })
  inspectionId: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  recordedById: string | null = null;

  @Property({ type: 'text' })
  recordedByName!: string;
}
