import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { BenchRun } from './bench-run.entity';
import { InspectionReading } from './inspection-reading.entity';
import { InspectionResult } from './inspection-result.entity';
import { Inspection } from './inspection.entity';
import { InspectionsService } from './inspections.service';
import { ReadingsImportService } from './readings-import.service';
import { RunsController } from './runs.controller';

@Module({
  imports: [MikroOrmModule.forFeature([BenchRun, Inspection, InspectionReading, InspectionResult])],
  controllers: [RunsController],
  providers: [InspectionsService, ReadingsImportService],
  exports: [InspectionsService],
})
export class InspectionsModule {}
