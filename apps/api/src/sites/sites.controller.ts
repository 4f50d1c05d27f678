import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { AnyTrialMember, TrialAccess } from '../common/decorators/access.decorator';
import { StaleEditAnswers } from '../protocol-gate/edit-version';
import { CurrentTrialAccess, CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateSiteDto } from './dto/create-site.dto';
import { RandomizeSiteDto } from './dto/randomize-site.dto';
import { UpdateSiteDto } from './dto/update-site.dto';
import { SitesService } from './sites.service';
import { SiteDto } from './dto/site.dto';

@ApiTags('sites')
@Controller('trials/:trialId/sites')
export class SitesController {
  constructor(private readonly sites: SitesService) {}

  @Get()
  @AnyTrialMember()
  @ApiOkResponse({ type: [SiteDto], description: 'The sites with their geometry, layout state and guardrail warnings.' })
  list(@CurrentTrialAccess() access: TrialAccessContext) {
    return this.sites.list(access.trialId);
  }

  @Post()
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong (e.g. name or prefix used, geometry incomplete); nothing written.' })
  @ApiConflictResponse({ description: 'The trial is locked.' })
  @ApiCreatedResponse({ type: SiteDto, description: 'The site as saved.' })
  create(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Body() body: CreateSiteDto) {
    return this.sites.create(access.trialId, user, body);
  }

  @Patch(':id')
  @TrialAccess('investigator')
  @ApiUnprocessableEntityResponse({ description: 'A field is wrong; nothing written.' })
  @StaleEditAnswers(SiteDto, 'the trial is locked, or a block change would touch a site with observations (problem body).')
  @ApiOkResponse({ type: SiteDto, description: 'The site after the change (its layout cleared when the blocks changed).' })
  update(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body() body: UpdateSiteDto) {
    return this.sites.update(access.trialId, id, user, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @TrialAccess('investigator')
  @ApiConflictResponse({ description: 'The trial is locked, or the site has observations.' })
  @ApiNoContentResponse({ description: 'The site was deleted.' })
  remove(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.sites.remove(access.trialId, id, user);
  }

  @Post(':siteId/randomize')
  @HttpCode(200)
  @TrialAccess('investigator')
  @ApiConflictResponse({ description: 'The trial is locked, has fewer than two treatments, or the site has observations.' })
  @ApiOkResponse({ type: SiteDto, description: 'The site with its new layout (randomizedAt, seed, plot count).' })
  randomize(@CurrentTrialAccess() access: TrialAccessContext, @CurrentUser() user: AuthUser, @Param('siteId', ParseIntPipe) siteId: number, @Body() body: RandomizeSiteDto) {
    return this.sites.randomize(access.trialId, siteId, user, body?.seed);
  }
}
