import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { inviteStudentsSchema, type InviteStudentsInput } from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import type { ClassSummary } from './classes.service';
import { InvitationsService, type InvitationPreview, type InvitationSummary } from './invitations.service';

@Controller()
export class InvitationsController {
  constructor(private readonly invitationsService: InvitationsService) {}

  @Roles('teacher')
  @Post('classes/:id/invitations')
  invite(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(inviteStudentsSchema)) body: InviteStudentsInput,
  ): Promise<InvitationSummary[]> {
    return this.invitationsService.invite(caller, id, body.emails);
  }

  @Roles('teacher')
  @Get('classes/:id/invitations')
  findAll(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<InvitationSummary[]> {
    return this.invitationsService.findAll(caller, id);
  }

  @Public()
  @Get('invitations/:token')
  preview(@Param('token') token: string): Promise<InvitationPreview> {
    return this.invitationsService.preview(token);
  }

  @Roles('student')
  @Post('invitations/:token/accept')
  @HttpCode(200)
  accept(@CurrentUser() caller: AuthUser, @Param('token') token: string): Promise<ClassSummary> {
    return this.invitationsService.accept(caller, token);
  }
}
