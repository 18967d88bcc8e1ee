import { Module } from '@nestjs/common';
import { TrendsController } from './trends.controller';
import { TrendsService } from './trends.service';

/** Read-only: trends are drawn from the inspection records, nothing is stored. */
@Module({
  controllers: [TrendsController],
  providers: [TrendsService],
})
export class TrendsModule {}
