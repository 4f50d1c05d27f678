import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiServiceUnavailableResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateInvitationDto } from './dto/create-invitation.dto';
import { InvitationsService } from './invitations.service';
import { InvitationDto } from './dto/invitation.dto';

@ApiTags('team')
@Controller('trials/:trialId/invitations')
export class TrialInvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get()
  @TrialAccess('investigator')
  @ApiOkResponse({ type: [InvitationDto], description: 'Invitation[]: every invitation of the trial, newest first, with its status.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.invitations.list(access.trialId);
  }

  @Post()
  @TrialAccess('investigator')
  @ApiCreatedResponse({ type: InvitationDto, description: 'The Invitation; the e-mail has been sent.' })
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong, e.g. a collaborator without a site of this trial.' })
  @ApiConflictResponse({ description: 'The person already holds this role, or has a pending invitation for it.' })
  @ApiServiceUnavailableResponse({ description: 'The mail server refused the e-mail; nothing was saved.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateInvitationDto) {
    return this.invitations.create(access.trialId, user, body);
  }

  @Post(':invitationId/resend')
  @HttpCode(200)
  @TrialAccess('investigator')
  @ApiOkResponse({ type: InvitationDto, description: 'The Invitation with a new link and expiry; the earlier link stops working.' })
  @ApiConflictResponse({ description: 'The invitation was already accepted or withdrawn.' })
  resend(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('invitationId', ParseIntPipe) invitationId: number) {
    return this.invitations.resend(access.trialId, user, invitationId);
  }

  @Delete(':invitationId')
  @TrialAccess('investigator')
  @ApiOkResponse({ type: InvitationDto, description: 'The Invitation, now withdrawn; its link answers 410.' })
  @ApiConflictResponse({ description: 'The invitation was already accepted.' })
  revoke(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('invitationId', ParseIntPipe) invitationId: number) {
    return this.invitations.revoke(access.trialId, user, invitationId);
  }
}
