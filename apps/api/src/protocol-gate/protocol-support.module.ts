import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { PlotRow } from '../plots/models/plot.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { LayoutImpactController } from './layout-impact.controller';
import { ObservationsGuardService } from './observations-guard.service';
import { ProtocolGateService } from './protocol-gate.service';
import { TrialMemberGuard } from './trial-member-guard.service';

/**
 * The write gate, the observations guard and the trial member guard, shared by every protocol feature,
 * and what a layout-clearing change would lose.
 */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([Trial, SiteRow, PlotRow, TrialMembership])],
  controllers: [LayoutImpactController],
  providers: [ObservationsGuardService, ProtocolGateService, TrialMemberGuard],
  exports: [ObservationsGuardService, ProtocolGateService, TrialMemberGuard],
})
export class ProtocolSupportModule {}
