import { Body, Controller, Get, Param, Post, Req, Res } from '@nestjs/common';
import {
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiGoneResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Public } from '../common/decorators/access.decorator';
import { AcceptInvitationDto } from './dto/accept-invitation.dto';
import { InvitationsService } from './invitations.service';
import { SessionsService } from '../auth/sessions.service';

/** The invitation link's own routes: public, because the invitee may have no account yet. */
@ApiTags('team')
@Controller('invitations/:token')
export class InvitationsController {
  constructor(
    private readonly invitations: InvitationsService,
    private readonly sessions: SessionsService,
  ) {}

  @Get()
  @Public()
  @ApiOkResponse({ description: 'InvitationPreview: the trial, role and site the link invites to.' })
  @ApiNotFoundResponse({ description: 'No invitation has this link (mistyped, or replaced by a resend).' })
  @ApiGoneResponse({ description: 'The invitation was already used, withdrawn or has expired.' })
  preview(@Param('token') token: string) {
    return this.invitations.preview(token);
  }

  @Post('accept')
  @Public()
  @ApiCreatedResponse({ description: 'InvitationAcceptResponse: a new account was made and is signed in.' })
  @ApiOkResponse({ description: 'InvitationAcceptResponse: the existing account joined and is signed in.' })
  @ApiUnprocessableEntityResponse({ description: 'A name and a password of at least 12 characters (not a common one) are needed for a new account.' })
  @ApiForbiddenResponse({ description: 'The password does not match the existing account, or the account is deactivated.' })
  @ApiNotFoundResponse({ description: 'No invitation has this link.' })
  @ApiGoneResponse({ description: 'The invitation was already used, withdrawn or has expired.' })
  async accept(@Param('token') token: string, @Body() body: AcceptInvitationDto, @Req() request: Request, @Res({ passthrough: true }) response: Response) {
    const { created, started, response: answer } = await this.invitations.accept(token, body, await this.sessions.optionalUser(request), {
      address: request.ip ?? '',
      userAgent: request.headers['user-agent'],
    });
    this.sessions.setCookie(response, started);
    response.status(created ? 201 : 200);
    return answer;
  }
}
