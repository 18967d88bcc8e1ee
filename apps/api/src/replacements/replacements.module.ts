import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { PartStatusService } from '../lots/part-status';
import { SetsModule } from '../sets/sets.module';
import { GrindRequestProgress } from './grind-request-progress';
import { GrindRequestStep } from './grind-request-step.entity';
import { GrindRequest } from './grind-request.entity';
import { GrindRequestsController } from './grind-requests.controller';
import { GrindRequestsService } from './grind-requests.service';
import { ReplacementsController } from './replacements.controller';
import { ReplacementsService } from './replacements.service';
import { SoldSets } from './sold-set';

@Module({
  imports: [MikroOrmModule.forFeature([GrindRequest, GrindRequestStep]), InspectionsModule, SetsModule],
  controllers: [ReplacementsController, GrindRequestsController],
  // Part status is derived from records (no state of its own), so this module derives it itself.
  providers: [ReplacementsService, GrindRequestsService, GrindRequestProgress, SoldSets, PartStatusService],
})
export class ReplacementsModule {}
