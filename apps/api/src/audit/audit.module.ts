import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Global, Module } from '@nestjs/common';
import { AuditEntry } from './audit-entry.entity';
import { AuditController } from './audit.controller';
import { AuditLogService } from './audit-log.service';
import { AuditService } from './audit.service';

@Global()
@Module({
  imports: [MikroOrmModule.forFeature([AuditEntry])],
  controllers: [AuditController],
  providers: [AuditService, AuditLogService],
  exports: [AuditService, AuditLogService],
})
export class AuditModule {}
