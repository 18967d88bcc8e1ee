import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { PartStatusService } from '../lots/part-status';
import { FreeStock } from './free-stock';
import { InterchangeService } from './interchange.service';
import { InterchangeController, SetsController } from './sets.controller';
import { SetsService } from './sets.service';

@Module({
  imports: [InspectionsModule],
  controllers: [SetsController, InterchangeController],
  providers: [SetsService, InterchangeService, FreeStock, PartStatusService],
  exports: [SetsService, InterchangeService, FreeStock],
})
export class SetsModule {}
