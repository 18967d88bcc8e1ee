import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type {
  GaugeStudyDetail,
  GaugeStudySummary,
  GaugeStudyTurn,
  SessionUser,
  WaitingGaugeStudy,
} from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import {
  CreateGaugeStudyDto,
  GaugeCorrectionDto,
  GaugeMeasurementDto,
  GaugeMeasurementIdDto,
  GaugeStudyIdDto,
} from './gauge-studies.dto';
import { GaugeStudiesService } from './gauge-studies.service';

/** The engineer sets studies up and reads their results; inspectors measure, blind. */
@ApiTags('gauge-studies')
@Controller('gauge-studies')
export class GaugeStudiesController {
  constructor(private readonly studies: GaugeStudiesService) {}

  @Get()
  @Roles('engineer')
  list(): Promise<{ items: GaugeStudySummary[] }> {
    return this.studies.list();
  }

  @Post()
  @Roles('engineer')
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateGaugeStudyDto): Promise<GaugeStudyDetail> {
    return this.studies.create(actor, body);
  }

  /** Active people with the inspector role, to choose a study's appraisers from. */
  @Get('inspectors')
  @Roles('engineer')
  inspectors(): Promise<{ items: { id: string; displayName: string }[] }> {
    return this.studies.inspectorChoices();
  }

  /** The caller's own studies with measurements still to make. */
  @Get('waiting')
  @Roles('inspector')
  waiting(@CurrentUser() actor: SessionUser): Promise<{ items: WaitingGaugeStudy[] }> {
    return this.studies.waiting(actor);
  }

  @Get(':id')
  @Roles('engineer')
  detail(@Param() { id }: GaugeStudyIdDto): Promise<GaugeStudyDetail> {
    return this.studies.detail(id);
  }

  @Get(':id/next')
  @Roles('inspector')
  next(@CurrentUser() actor: SessionUser, @Param() { id }: GaugeStudyIdDto): Promise<GaugeStudyTurn> {
    return this.studies.turn(actor, id);
  }

  @Post(':id/measurements')
  @Roles('inspector')
  measure(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: GaugeStudyIdDto,
    @Body() body: GaugeMeasurementDto,
  ): Promise<GaugeStudyTurn> {
    return this.studies.measure(actor, id, body);
  }

  @Post(':id/measurements/:measurementId/corrections')
  @Roles('inspector')
  correct(
    @CurrentUser() actor: SessionUser,
    @Param() { id, measurementId }: GaugeMeasurementIdDto,
    @Body() body: GaugeCorrectionDto,
  ): Promise<GaugeStudyTurn> {
    return this.studies.correct(actor, id, measurementId, body);
  }
}
