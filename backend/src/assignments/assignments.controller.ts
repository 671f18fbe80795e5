import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Param,
  Patch,
  Post,
  Query,
} from '@nestjs/common';
import { ApiOkResponse } from '@nestjs/swagger';
import {
  createAssignmentSchema,
  updateAssignmentSchema,
  type CreateAssignmentInput,
  type UpdateAssignmentInput,
} from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import { AssignmentsService, type AssignmentView } from './assignments.service';

@Controller('assignments')
export class AssignmentsController {
  constructor(private readonly assignmentsService: AssignmentsService) {}

  @Roles('teacher')
  @Post()
  create(
    @CurrentUser() caller: AuthUser,
    @Body(new SchemaValidationPipe(createAssignmentSchema)) body: CreateAssignmentInput,
  ): Promise<AssignmentView> {
    return this.assignmentsService.create(caller, body);
  }

  /** Sent as the JSON text the service builds (AssignmentView[]), not serialised again. */
  @Get()
  @Header('Content-Type', 'application/json; charset=utf-8')
  @ApiOkResponse({
    description: 'AssignmentView[]: for a student with `status`, for a teacher with `counts`.',
  })
  findAll(@CurrentUser() caller: AuthUser, @Query('classId') classId?: string): Promise<string> {
    const valid = classId && /^[0-9a-f-]{36}$/i.test(classId) ? classId : undefined;
    return this.assignmentsService.findAllJson(caller, { classId: valid });
  }

  @Get(':id')
  findOne(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
  ): Promise<AssignmentView> {
    return this.assignmentsService.findOne(caller, id);
  }

  @Roles('teacher')
  @Patch(':id')
  update(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(updateAssignmentSchema)) body: UpdateAssignmentInput,
  ): Promise<AssignmentView> {
    return this.assignmentsService.update(caller, id, body);
  }

  @Roles('teacher')
  @Delete(':id')
  @HttpCode(204)
  remove(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<void> {
    return this.assignmentsService.remove(caller, id);
  }
}
