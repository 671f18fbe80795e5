import { Body, Controller, Get, Param, Patch, Post, Query, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { createAttemptSchema, overrideMarkSchema, type CreateAttemptInput, type OverrideMarkInput } from '@mixmark/common';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import { photoContentType } from '../storage/storable-photo';
import type { AttemptView } from './attempt-view';
import { AttemptsService } from './attempts.service';

const uuid = (value?: string) => (value && /^[0-9a-f-]{36}$/i.test(value) ? value : undefined);

@Controller('attempts')
export class AttemptsController {
  constructor(private readonly attemptsService: AttemptsService) {}

  /** Multipart: `photo` (the file) with `drillId` or `assignmentId`. 202: queued for grading. */
  @Roles('student')
  @Post()
  @UseInterceptors(FileInterceptor('photo'))
  async create(
    @CurrentUser() caller: AuthUser,
    @Body(new SchemaValidationPipe(createAttemptSchema)) body: CreateAttemptInput,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Res({ passthrough: true }) response: Response,
  ): Promise<AttemptView> {
    const view = await this.attemptsService.create(caller, body, file);
    response.status(202);
    return view;
  }

  @Get()
  findAll(
    @CurrentUser() caller: AuthUser,
    @Query('assignmentId') assignmentId?: string,
    @Query('drillId') drillId?: string,
    @Query('studentId') studentId?: string,
  ): Promise<AttemptView[]> {
    return this.attemptsService.findAll(caller, { assignmentId: uuid(assignmentId), drillId: uuid(drillId), studentId: uuid(studentId) });
  }

  @Get(':id')
  findOne(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<AttemptView> {
    return this.attemptsService.findOne(caller, id);
  }

  @Get(':id/photo')
  async photo(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string, @Res() response: Response): Promise<void> {
    const bytes = await this.attemptsService.image(caller, id, 'photo');
    response.type(photoContentType(bytes)).setHeader('cache-control', 'private, max-age=86400');
    response.send(bytes);
  }

  @Get(':id/overlay')
  async overlay(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string, @Res() response: Response): Promise<void> {
    const bytes = await this.attemptsService.image(caller, id, 'overlay');
    // JPEG since overlays were made smaller; attempts graded before keep their PNG.
    response.type(photoContentType(bytes)).setHeader('cache-control', 'private, max-age=300');
    response.send(bytes);
  }

  @Roles('teacher')
  @Patch(':id/override')
  override(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(overrideMarkSchema)) body: OverrideMarkInput,
  ): Promise<AttemptView> {
    return this.attemptsService.override(caller, id, body);
  }
}
