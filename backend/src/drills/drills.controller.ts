import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { createDrillSchema, type CreateDrillInput } from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import { DrillsService, type DrillScope } from './drills.service';
import type { Drill } from './entities/drill.entity';

@Controller('drills')
export class DrillsController {
  constructor(private readonly drillsService: DrillsService) {}

  @Roles('teacher')
  @Post()
  create(@CurrentUser() caller: AuthUser, @Body(new SchemaValidationPipe(createDrillSchema)) body: CreateDrillInput): Promise<Drill> {
    return this.drillsService.create(caller, body);
  }

  @Get()
  findAll(@CurrentUser() caller: AuthUser, @Query('scope') scope?: string): Promise<Drill[]> {
    const known: DrillScope[] = ['mine', 'library', 'all'];
    return this.drillsService.findAll(caller, known.includes(scope as DrillScope) ? (scope as DrillScope) : 'all');
  }

  @Get(':id')
  findOne(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<Drill> {
    return this.drillsService.findVisible(caller, id);
  }

  @Roles('teacher')
  @Put(':id')
  update(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(createDrillSchema)) body: CreateDrillInput,
  ): Promise<Drill> {
    return this.drillsService.update(caller, id, body);
  }

  @Roles('teacher')
  @Post(':id/duplicate')
  duplicate(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<Drill> {
    return this.drillsService.duplicate(caller, id);
  }

  @Roles('teacher')
  @Delete(':id')
  @HttpCode(204)
  remove(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<void> {
    return this.drillsService.remove(caller, id);
  }
}
