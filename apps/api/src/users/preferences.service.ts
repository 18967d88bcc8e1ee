import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { PreferencesInput, SessionUser } from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { User } from './user.entity';

/** A person's own choices, such as the unit lengths are shown in. */
@Injectable()
export class PreferencesService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async update(actor: SessionUser, input: PreferencesInput): Promise<SessionUser> {
    return this.em.transactional(async (em) => {
      const user = await em.findOne(User, { id: actor.id });
      if (!user) throw new NotFoundException('This person');
      const before = user.displayUnit;
      if (before !== input.displayUnit) {
        user.displayUnit = input.displayUnit;
        this.audit.record(actor, {
          action: 'user.preferences',
          subjectType: 'user',
          subjectId: user.id,
          before: { displayUnit: before },
          after: { displayUnit: user.displayUnit },
        });
      }
      return { ...actor, displayUnit: user.displayUnit };
    });
  }
}
