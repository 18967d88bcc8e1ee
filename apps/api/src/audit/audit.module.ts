import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Global, Module } from '@nestjs/common';
import { AuditEntry } from './audit-entry.entity';
import { AuditService } from './audit.service';

@Global()
@Module({
  imports: [MikroOrmModule.forFeature([AuditEntry])],
  providers: [AuditService],
  exports: [AuditService],
})
export class AuditModule {}
