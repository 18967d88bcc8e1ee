import {
  Body,
  Controller,
  Get,
  HttpCode,
  Param,
  Post,
  Query,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { CalibrationRecorded, Master as MasterView, MasterDetail, Page, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { CertificateUploadInterceptor, type UploadedCertificate } from '../files/certificate-upload.interceptor';
import {
  CalibrationFormDto,
  CalibrationIdDto,
  CreateMasterDto,
  GaugeListQueryDto,
  MasterIdDto,
  RetireDto,
} from './masters.dto';
import { MastersService } from './masters.service';

@ApiTags('master gauges')
@Controller('masters')
@Roles('engineer')
export class MastersController {
  constructor(private readonly masters: MastersService) {}

  /** `?usable=true`: only masters that may be used at the Bench (calibrated, not overdue, not retired). */
  @Get()
  @Roles('engineer', 'inspector')
  list(@Query() query: GaugeListQueryDto): Promise<Page<MasterView>> {
    return this.masters.list(query);
  }

  @Get(':id')
  @Roles('engineer', 'inspector')
  detail(@Param() { id }: MasterIdDto): Promise<MasterDetail> {
    return this.masters.detail(id);
  }

  @Get(':id/calibrations/:calibrationId/certificate')
  @Roles('engineer', 'inspector')
  async certificate(@Param() { id, calibrationId }: CalibrationIdDto): Promise<StreamableFile> {
    const file = await this.masters.certificate(id, calibrationId);
    return new StreamableFile(file.content, {
      type: file.contentType,
      length: file.content.length,
      disposition: `attachment; filename="${file.filename}"`,
    });
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateMasterDto): Promise<MasterView> {
    return this.masters.create(actor, body);
  }

  @Post(':id/retire')
  @HttpCode(200)
  retire(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: MasterIdDto,
    @Body() body: RetireDto,
  ): Promise<MasterView> {
    return this.masters.retire(actor, id, body.reason);
  }

  /**
   * Multipart: the calibration's fields and its certificate file in field `certificate`. A correction
   * answers its impact report: the parts whose verdict changed when their heights were recomputed.
   */
  @Post(':id/calibrations')
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(CertificateUploadInterceptor)
  addCalibration(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: MasterIdDto,
    @Body() body: CalibrationFormDto,
    @UploadedFile() file: UploadedCertificate | undefined,
  ): Promise<CalibrationRecorded> {
    return this.masters.addCalibration(actor, id, body, file);
  }
}
