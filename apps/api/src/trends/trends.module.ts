import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { PartStatusService } from '../lots/part-status';
import { TrendsController } from './trends.controller';
import { TrendsService } from './trends.service';

/** Read-only: trends are drawn from the inspection records, nothing is stored. */
@Module({
  imports: [InspectionsModule],
  controllers: [TrendsController],
  providers: [TrendsService, PartStatusService],
})
export class TrendsModule {}
