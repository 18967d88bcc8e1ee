import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { PartStatusService } from '../lots/part-status';
import { GrindRequestProgress } from '../replacements/grind-request-progress';
import { SetsModule } from '../sets/sets.module';
import { TrendsService } from '../trends/trends.service';
import { HomeController } from './home.controller';
import { HomeService } from './home.service';

@Module({
  imports: [InspectionsModule, SetsModule],
  controllers: [HomeController],
  // Part status, grind-request progress and trends are derived from records (no state), so derived here too.
  providers: [HomeService, PartStatusService, GrindRequestProgress, TrendsService],
})
export class HomeModule {}
