import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { PlotRow } from '../plots/models/plot.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { LayoutImpactController } from './layout-impact.controller';
import { ObservationsGuardService } from './observations-guard.service';
import { ProtocolGateService } from './protocol-gate.service';

/** The write gate and the observations guard, shared by every protocol feature, and what a layout-clearing change would lose. */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([Trial, SiteRow, PlotRow])],
  controllers: [LayoutImpactController],
  providers: [ObservationsGuardService, ProtocolGateService],
  exports: [ObservationsGuardService, ProtocolGateService],
})
export class ProtocolSupportModule {}
