import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { CalibrationCertificate } from './calibration-certificate.entity';
import { MasterCalibration } from './master-calibration.entity';
import { MasterGauge } from './master-gauge.entity';
import { MastersController } from './masters.controller';
import { MastersService } from './masters.service';

@Module({
  imports: [MikroOrmModule.forFeature([MasterGauge, MasterCalibration, CalibrationCertificate]), InspectionsModule],
  controllers: [MastersController],
  providers: [MastersService],
})
export class MastersModule {}
