import { Module } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { SequelizeModule } from '@nestjs/sequelize';
import { authConfig } from '../config/auth.config';
import { MailModule } from '../mail/mail.module';
import { TeamModule } from '../team/team.module';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';
import { InvitationsController } from './invitations.controller';
import { InvitationsService } from './invitations.service';
import { TrialInvitation } from './models/trial-invitation.model';
import { OptionalCallerService } from './optional-caller.service';
import { TrialInvitationsController } from './trial-invitations.controller';

@Module({
  imports: [
    SequelizeModule.forFeature([TrialInvitation, TrialMembership, Trial, User]),
    MailModule,
    TeamModule,
    JwtModule.registerAsync({
      inject: [authConfig.KEY],
      useFactory: (config: ConfigType<typeof authConfig>) => ({ secret: config.jwtSecret }),
    }),
  ],
  controllers: [TrialInvitationsController, InvitationsController],
  providers: [InvitationsService, OptionalCallerService],
})
export class InvitationsModule {}
