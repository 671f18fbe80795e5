import { Controller, Get, Param, Res } from '@nestjs/common';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { gradebookCsv, type Gradebook } from './gradebook';
import { ProgressService } from './progress.service';
import type { ProgressSummary } from './summarise-progress';

@Controller()
export class ProgressController {
  constructor(private readonly progressService: ProgressService) {}

  @Get('progress/me')
  mine(@CurrentUser() caller: AuthUser) {
    return this.progressService.forStudent(caller, caller.id);
  }

  @Roles('teacher')
  @Get('progress/students/:id')
  student(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string) {
    return this.progressService.forStudent(caller, id);
  }

  @Roles('teacher')
  @Get('progress/classes/:id')
  klass(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<ProgressSummary> {
    return this.progressService.forClass(caller, id);
  }

  @Roles('teacher')
  @Get('classes/:id/gradebook')
  gradebook(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<Gradebook> {
    return this.progressService.gradebook(caller, id);
  }

  @Roles('teacher')
  @Get('classes/:id/gradebook.csv')
  async gradebookCsv(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string, @Res() response: Response): Promise<void> {
    const book = await this.progressService.gradebook(caller, id);
    const name = book.className.replace(/[^\w-]+/g, '-').replace(/^-|-$/g, '') || 'class';
    response
      .type('text/csv; charset=utf-8')
      .setHeader('content-disposition', `attachment; filename="gradebook-${name}.csv"`)
      .send(`\uFEFF${gradebookCsv(book)}`); // the BOM makes spreadsheet programs read UTF-8
  }
}
