import { Body, Controller, Get, HttpCode, Param, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiConsumes, ApiTags } from '@nestjs/swagger';
import {
  MAX_READINGS_FILE_BYTES,
  type Inspection as InspectionView,
  type ReadingsImport,
  type ReadingsPreview,
  type Run as RunView,
  type SessionUser,
} from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { describeNonText } from '../files/file-type';
import { singleFileInterceptor, type UploadedFileContent } from '../files/single-file.interceptor';
import { CreateInspectionDto, CreateRunDto, EndRunDto, RunIdDto } from './inspections.dto';
import { CsvMissingException, CsvNotTextException, CsvTooLargeException } from './inspections.exception';
import { InspectionsService } from './inspections.service';
import { ReadingsImportService } from './readings-import.service';

const CsvUpload = singleFileInterceptor('file', MAX_READINGS_FILE_BYTES, () => new CsvTooLargeException());

/** The uploaded readings, refused unless they read as text (judged by content, not by name). */
function contentOf(file: UploadedFileContent | undefined): Buffer {
  if (!file) throw new CsvMissingException();
  const notText = describeNonText(file.buffer);
  if (notText) throw new CsvNotTextException(file.originalname, notText);
  return file.buffer;
}

/** The Bench: runs, inspections and uploaded readings. No route changes or deletes an inspection. */
@ApiTags('bench runs')
@Controller('runs')
@Roles('inspector')
export class RunsController {
  constructor(
    private readonly inspections: InspectionsService,
    private readonly readings: ReadingsImportService,
  ) {}

  @Post()
  start(@CurrentUser() actor: SessionUser, @Body() body: CreateRunDto): Promise<RunView> {
    return this.inspections.startRun(actor, body);
  }

  @Get(':id')
  @Roles('engineer', 'inspector')
  view(@Param() { id }: RunIdDto): Promise<RunView> {
    return this.inspections.viewRun(id);
  }

  /** The master check at the end of the run; drift beyond the limit flags the run. */
  @Post(':id/end')
  @HttpCode(200)
  end(@CurrentUser() actor: SessionUser, @Param() { id }: RunIdDto, @Body() body: EndRunDto): Promise<RunView> {
    return this.inspections.endRun(actor, id, body);
  }

  @Post(':id/inspections')
  inspect(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: RunIdDto,
    @Body() body: CreateInspectionDto,
  ): Promise<InspectionView> {
    return this.inspections.inspect(actor, id, body);
  }

  /** Multipart field `file`: what the CSV would import, with every row-level problem; saves nothing. */
  @Post(':id/readings/preview')
  @HttpCode(200)
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(CsvUpload)
  preview(@Param() { id }: RunIdDto, @UploadedFile() file: UploadedFileContent | undefined): Promise<ReadingsPreview> {
    return this.readings.preview(id, contentOf(file));
  }

  /** Multipart field `file`: imports every part's inspection in one transaction, or nothing. */
  @Post(':id/readings/import')
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(CsvUpload)
  import(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: RunIdDto,
    @UploadedFile() file: UploadedFileContent | undefined,
  ): Promise<ReadingsImport> {
    return this.readings.import(actor, id, contentOf(file));
  }
}
