import { Check, Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Part } from '../lots/part.entity';
import { User } from '../users/user.entity';
import { GaugeStudy } from './gauge-study.entity';

/**
 * One planned measurement of the schedule: this inspector measures this part in this trial, as
 * their `sequence`-th measurement of the study. Permanent.
 */
@Entity({ tableName: 'gauge_study_slot' })
@Unique({ properties: ['study', 'inspector', 'sequence'] })
@Unique({ properties: ['study', 'inspector', 'trial', 'part'] })
@Check({
  name: 'gauge_study_slot_values_check',
  expression: 'trial >= 1 and sequence >= 1 and inspector_position >= 1',
})
export class GaugeStudySlot extends BaseEntity {
  @ManyToOne(() => GaugeStudy)
  @Index()
  study!: GaugeStudy;

  @ManyToOne(() => Part, { eager: true })
  part!: Part;

  @ManyToOne(() => User)
  @Index()
  inspector!: User;

  /** The name as it was at set-up, so the study reads the same if the person is renamed. */
  @Property({ type: 'text' })
  inspectorName!: string;

  /** The inspector's place in the study (1, 2, 3…): the order of the analysis and the charts. */
  @Property({ type: 'integer' })
  inspectorPosition!: number;

  @Property({ type: 'integer' })
  trial!: number;

  @Property({ type: 'integer' })
  sequence!: number;
}
