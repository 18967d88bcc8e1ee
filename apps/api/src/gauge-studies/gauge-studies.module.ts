import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { GaugeStudiesController } from './gauge-studies.controller';
import { GaugeStudiesService } from './gauge-studies.service';
import { GaugeStudyMeasurement } from './gauge-study-measurement.entity';
import { GaugeStudySlot } from './gauge-study-slot.entity';
import { GaugeStudy } from './gauge-study.entity';

@Module({
  imports: [MikroOrmModule.forFeature([GaugeStudy, GaugeStudySlot, GaugeStudyMeasurement])],
  controllers: [GaugeStudiesController],
  providers: [GaugeStudiesService],
})
export class GaugeStudiesModule {}
