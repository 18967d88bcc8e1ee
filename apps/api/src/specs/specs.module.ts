import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { Spec } from './spec.entity';
import { SpecsController } from './specs.controller';
import { SpecsService } from './specs.service';

@Module({
  imports: [MikroOrmModule.forFeature([Spec])],
  controllers: [SpecsController],
  providers: [SpecsService],
})
export class SpecsModule {}
