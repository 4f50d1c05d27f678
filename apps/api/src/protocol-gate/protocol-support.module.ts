import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { PlotRow } from '../plots/models/plot.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { LayoutImpactController } from './layout-impact.controller';
import { ObservationsGuardService } from './observations-guard.service';
import { ProtocolGateService } from './protocol-gate.service';
import { RemovalImpactService } from './removal-impact.service';
import { TrialMemberGuard } from './trial-member-guard.service';

/**
 * The write gate, the observations guard and the trial member guard, shared by every protocol feature,
 * what a layout-clearing change would lose, and what removing a measure or round would archive.
 */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([Trial, SiteRow, PlotRow, TrialMembership])],
  controllers: [LayoutImpactController],
  providers: [ObservationsGuardService, ProtocolGateService, RemovalImpactService, TrialMemberGuard],
  exports: [ObservationsGuardService, ProtocolGateService, RemovalImpactService, TrialMemberGuard],
})
export class ProtocolSupportModule {}
