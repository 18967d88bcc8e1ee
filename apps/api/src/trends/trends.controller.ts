import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Trend, TrendPartNumber } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { TrendPartNumberDto, TrendQueryDto } from './trends.dto';
import { TrendsService } from './trends.service';

@ApiTags('trends')
@Controller('trends')
@Roles('engineer', 'admin', 'inspector')
export class TrendsController {
  constructor(private readonly trends: TrendsService) {}

  /** Part numbers with a released revision. */
  @Get()
  partNumbers(): Promise<{ items: TrendPartNumber[] }> {
    return this.trends.partNumbers();
  }

  /** Control charts, signals, capability and histogram of one part number's heights. */
  @Get(':partNumber')
  trend(@Param() { partNumber }: TrendPartNumberDto, @Query() query: TrendQueryDto): Promise<Trend> {
    return this.trends.trend(partNumber, query);
  }
}
