import { Module } from '@nestjs/common';
import { ConfigModule, type ConfigType } from '@nestjs/config';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { SequelizeModule } from '@nestjs/sequelize';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { resolve } from 'node:path';
import { ActivityModule } from './activity/activity.module';
import { AuthModule } from './auth/auth.module';
import { ProtocolSupportModule } from './protocol-gate/protocol-support.module';
import { DemoModule } from './demo/demo.module';
import { FactorsModule } from './factors/factors.module';
import { MeasuresModule } from './measures/measures.module';
import { PlotsModule } from './plots/plots.module';
import { RatesModule } from './rates/rates.module';
import { RoundsModule } from './rounds/rounds.module';
import { SitesModule } from './sites/sites.module';
import { StatsModule } from './stats/stats.module';
import { TreatmentsModule } from './treatments/treatments.module';
import { AccessGuard } from './auth/guards/access.guard';
import { JwtAuthGuard } from './auth/guards/jwt-auth.guard';
import { ProblemFilter } from './common/filters/problem.filter';
import { RateLimitsModule } from './common/security/rate-limits.module';
import { SharedThrottlerStorage } from './common/security/shared-throttler-storage';
import { appConfig } from './config/app.config';
import { authConfig } from './config/auth.config';
import { databaseConfig } from './config/database.config';
import { mailConfig } from './config/mail.config';
import { sequelizeOptions } from './database/sequelize-options';
import { DataStampsModule } from './data-stamps/data-stamps.module';
import { DevModule } from './dev/dev.module';
import { HealthModule } from './health/health.module';
import { InvitationsModule } from './invitations/invitations.module';
import { RemindersModule } from './reminders/reminders.module';
import { TeamModule } from './team/team.module';
import { TrialsModule } from './trials/trials.module';
import { UsersModule } from './users/users.module';
import { IntakeModule } from './intake/intake.module';
import { LedgerModule } from './ledger/ledger.module';
import { PhotosModule } from './photos/photos.module';
import { FindingsModule } from './findings/findings.module';
import { AnalysesModule } from './analyses/analyses.module';
import { ExportsModule } from './exports/exports.module';
import { ReportsModule } from './reports/reports.module';

@Module({
  imports: [
    ConfigModule.forRoot({
      isGlobal: true,
      envFilePath: [resolve(__dirname, '../../../.env')],
      load: [appConfig, databaseConfig, authConfig, mailConfig],
    }),
    SequelizeModule.forRootAsync({
      inject: [databaseConfig.KEY],
      useFactory: (config: ConfigType<typeof databaseConfig>) => ({
        ...sequelizeOptions(config),
        autoLoadModels: true,
        synchronize: false,
      }),
    }),
    // Flood protection per client address (@nestjs/throttler); sign-in has its own, tighter limit. The counters
    // are shared by every API instance through Redis when REDIS_URL is set (common/security/shared-throttler-storage.ts).
    ThrottlerModule.forRootAsync({
      imports: [RateLimitsModule],
      inject: [authConfig.KEY, SharedThrottlerStorage],
      useFactory: (config: ConfigType<typeof authConfig>, storage: SharedThrottlerStorage) => ({
        storage,
        throttlers: [{ name: 'default', ttl: 60_000, limit: config.requestsPerMinute }],
        errorMessage: 'Too many requests from this address. Please wait a minute and try again.',
      }),
    }),
    DataStampsModule,
    AuthModule,
    UsersModule,
    StatsModule,
    TrialsModule,
    HealthModule,
    ActivityModule,
    ProtocolSupportModule,
    FactorsModule,
    TreatmentsModule,
    MeasuresModule,
    RoundsModule,
    SitesModule,
    PlotsModule,
    RatesModule,
    DemoModule,
    TeamModule,
    InvitationsModule,
    DevModule,
    RemindersModule,
    IntakeModule,
    LedgerModule,
    PhotosModule,
    FindingsModule,
    AnalysesModule,
    ExportsModule,
    ReportsModule,
  ],
  providers: [
    { provide: APP_GUARD, useClass: ThrottlerGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: AccessGuard },
    { provide: APP_FILTER, useClass: ProblemFilter },
  ],
})
export class AppModule {}
