import { Body, Controller, Delete, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { inviteStudentsSchema, type InviteStudentsInput } from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import type { ClassSummary } from './classes.service';
import { InvitationsService, type InvitationPreview, type InvitationSummary } from './invitations.service';

@ApiTags('invitations')
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

  @Roles('teacher')
  @Post('classes/:id/invitations/:invitationId/resend')
  @HttpCode(200)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Send a pending invitation again with a new link and a fresh expiry; the old link stops working.' })
  @ApiOkResponse({ description: 'The invitation summary { id, email, createdAt, expiresAt }.' })
  @ApiNotFoundResponse({ description: 'No such class of this teacher, or no pending invitation with this id in it.' })
  resend(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Param('invitationId', parseId()) invitationId: string,
  ): Promise<InvitationSummary> {
    return this.invitationsService.resend(caller, id, invitationId);
  }

  @Roles('teacher')
  @Delete('classes/:id/invitations/:invitationId')
  @HttpCode(204)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Revoke a pending invitation; its link then answers invitation_unknown (404).' })
  @ApiNoContentResponse({ description: 'Revoked.' })
  @ApiNotFoundResponse({ description: 'No such class of this teacher, or no pending invitation with this id in it.' })
  revoke(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Param('invitationId', parseId()) invitationId: string,
  ): Promise<void> {
    return this.invitationsService.revoke(caller, id, invitationId);
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
