import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module';
import { SetsModule } from '../sets/sets.module';
import { Lot } from './lot.entity';
import { LotsController } from './lots.controller';
import { LotsService } from './lots.service';
import { PartDisposition } from './part-disposition.entity';
import { PartStatusService } from './part-status';
import { Part } from './part.entity';
import { PartsController } from './parts.controller';
import { PartsService } from './parts.service';

@Module({
  imports: [MikroOrmModule.forFeature([Lot, Part, PartDisposition]), InspectionsModule, SetsModule],
  controllers: [LotsController, PartsController],
  providers: [LotsService, PartsService, PartStatusService],
})
export class LotsModule {}
