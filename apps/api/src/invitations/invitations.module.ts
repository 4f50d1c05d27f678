import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuthModule } from '../auth/auth.module';
import { MailModule } from '../mail/mail.module';
import { TeamModule } from '../team/team.module';
import { Trial } from '../trials/models/trial.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';
import { InvitationsController } from './invitations.controller';
import { InvitationsService } from './invitations.service';
import { TrialInvitation } from './models/trial-invitation.model';
import { TrialInvitationsController } from './trial-invitations.controller';

@Module({
  imports: [
    SequelizeModule.forFeature([TrialInvitation, TrialMembership, Trial, User]),
    MailModule,
    TeamModule,
    AuthModule,
  ],
  controllers: [TrialInvitationsController, InvitationsController],
  providers: [InvitationsService],
})
export class InvitationsModule {}
