import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import {
  createClassSchema,
  joinClassSchema,
  updateClassSchema,
  type CreateClassInput,
  type JoinClassInput,
  type UpdateClassInput,
} from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import { ClassesService, type ClassSummary, type RosterEntry } from './classes.service';

@Controller('classes')
export class ClassesController {
  constructor(private readonly classesService: ClassesService) {}

  @Roles('teacher')
  @Post()
  create(@CurrentUser() caller: AuthUser, @Body(new SchemaValidationPipe(createClassSchema)) body: CreateClassInput): Promise<ClassSummary> {
    return this.classesService.create(caller, body);
  }

  @Get()
  findAll(@CurrentUser() caller: AuthUser, @Query('archived') archived?: string): Promise<ClassSummary[]> {
    return this.classesService.findAll(caller, { includeArchived: archived === 'true' });
  }

  @Roles('student')
  @Post('join')
  @HttpCode(200)
  join(@CurrentUser() caller: AuthUser, @Body(new SchemaValidationPipe(joinClassSchema)) body: JoinClassInput): Promise<ClassSummary> {
    return this.classesService.join(caller, body.code);
  }

  @Get(':id')
  findOne(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<ClassSummary> {
    return this.classesService.findOne(caller, id);
  }

  @Roles('teacher')
  @Patch(':id')
  update(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(updateClassSchema)) body: UpdateClassInput,
  ): Promise<ClassSummary> {
    return this.classesService.update(caller, id, body);
  }

  @Roles('teacher')
  @Get(':id/students')
  roster(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<RosterEntry[]> {
    return this.classesService.roster(caller, id);
  }

  @Roles('teacher')
  @Delete(':id/students/:studentId')
  @HttpCode(204)
  removeStudent(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Param('studentId', parseId()) studentId: string,
  ): Promise<void> {
    return this.classesService.removeStudent(caller, id, studentId);
  }
}
