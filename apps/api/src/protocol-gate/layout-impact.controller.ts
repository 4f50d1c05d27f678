import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { TrialAccessContext } from '../common/auth-user';
import { TrialAccess } from '../common/decorators/access.decorator';
import { CurrentTrialAccess } from '../common/decorators/current-user.decorator';
import { LayoutImpactQueryDto } from './dto/layout-impact-query.dto';
import { LayoutImpactDto } from './dto/layout-impact.dto';
import { ProtocolGateService } from './protocol-gate.service';

@ApiTags('protocol')
@Controller('trials/:trialId/layout-impact')
export class LayoutImpactController {
  constructor(private readonly gate: ProtocolGateService) {}

  @Get()
  @TrialAccess('investigator')
  @ApiOperation({
    summary:
      'What a change that clears layouts (the design, adding or removing a treatment, the factors; a site’s blocks, removing or randomizing it again) would lose, asked before making it',
  })
  @ApiOkResponse({ type: LayoutImpactDto, description: 'LayoutImpact: the sites, plots and values touched, a sentence, and the refusal when values are recorded.' })
  get(@CurrentTrialAccess() access: TrialAccessContext, @Query() query: LayoutImpactQueryDto) {
    return this.gate.layoutImpact(access.trialId, query.siteId);
  }
}
