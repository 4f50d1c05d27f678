import { Module } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { SequelizeModule } from '@nestjs/sequelize';
import { authConfig } from '../config/auth.config';
import { MailModule } from '../mail/mail.module';
import { User } from '../users/models/user.model';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { PasswordReset } from './models/password-reset.model';
import { SignInLockout } from './models/sign-in-lockout.model';
import { UserSession } from './models/user-session.model';
import { PasswordHasher } from './password-hasher.service';
import { SessionsService } from './sessions.service';
import { VerifiedTokens } from './verified-tokens';
import { SignInLockoutService } from './sign-in-lockout.service';
import { JwtStrategy } from './strategies/jwt.strategy';

@Module({
  imports: [
    PassportModule,
    MailModule,
    SequelizeModule.forFeature([User, UserSession, SignInLockout, PasswordReset]),
    // One algorithm, and issuer and audience written into every token and required of every token.
    JwtModule.registerAsync({
      inject: [authConfig.KEY],
      useFactory: (config: ConfigType<typeof authConfig>) => ({
        secret: config.jwtSecret,
        signOptions: { algorithm: 'HS256', issuer: config.jwtIssuer, audience: config.jwtAudience },
        verifyOptions: { algorithms: ['HS256'], issuer: config.jwtIssuer, audience: config.jwtAudience },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, SignInLockoutService, SessionsService, PasswordHasher, JwtStrategy, VerifiedTokens],
  exports: [SessionsService, PasswordHasher, SignInLockoutService, VerifiedTokens],
})
export class AuthModule {}
