import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { PasswordHasher } from '../auth/password-hasher.service';
import { passwordProblem } from '../auth/password-policy';
import { SessionsService } from '../auth/sessions.service';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import type { CreateUserDto } from './dto/create-user.dto';
import type { MySettingsDto, UpdateUserDto } from './dto/update-user.dto';
import { User } from './models/user.model';
import { toPublicUser, type PublicUser } from './public-user';

/** A BCP 47 tag in its canonical spelling, or a 422 naming the field. */
function canonicalLocale(tag: string): string {
  try {
    const [canonical] = Intl.getCanonicalLocales(tag.trim());
    if (canonical && Intl.NumberFormat.supportedLocalesOf([canonical]).length) return canonical;
  } catch {
    // Not a language tag at all: answered below.
  }
  throw new FieldProblemsException([{ field: 'locale', message: `locale "${tag}" is not a language tag this server knows; try one such as en-GB, en-US, de-DE or fr-FR` }]);
}

@Injectable()
export class UsersService {
  constructor(
    @InjectModel(User) private readonly users: typeof User,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly hasher: PasswordHasher,
    private readonly sessions: SessionsService,
  ) {}

  async list(): Promise<PublicUser[]> {
    const users = await this.users.findAll({ order: [['name', 'ASC']] });
    return users.map(toPublicUser);
  }

  async create(input: CreateUserDto): Promise<PublicUser> {
    const email = input.email.trim().toLowerCase();
    const weak = passwordProblem(input.password, { email, name: input.name });
    if (weak) throw new FieldProblemsException([{ field: 'password', message: weak }], weak);
    const user = await this.users.create({
      email,
      name: input.name.trim(),
      passwordHash: await this.hasher.hash(input.password),
      isAdmin: input.isAdmin ?? false,
      isActive: true,
    });
    return toPublicUser(user);
  }

  async setActive(userId: number, isActive: boolean, actingUserId: number): Promise<PublicUser> {
    return this.update(userId, { isActive }, actingUserId);
  }

  /** One's own display name, locale and e-mail preferences. */
  async updateMine(userId: number, input: MySettingsDto): Promise<PublicUser> {
    const { name, locale, emailReminders, emailReceipts } = input;
    return this.update(userId, { name, locale, emailReminders, emailReceipts }, userId);
  }

  /**
   * An administrator's change to an account. Deactivating ends every session at once; reactivating does
   * not bring any back (the person signs in afresh).
   */
  async update(userId: number, input: UpdateUserDto, actingUserId: number): Promise<PublicUser> {
    const user = await this.users.findByPk(userId);
    if (!user) throw new NotFoundException(`No person with id ${userId}.`);
    if (user.id === actingUserId && (input.isActive === false || input.isAdmin === false) && user.isAdmin) {
      throw new BadRequestException(input.isActive === false ? 'You cannot deactivate your own account.' : 'You cannot take away your own administrator rights; ask another administrator.');
    }
    const changes: Partial<User> = {};
    if (input.name !== undefined) changes.name = input.name.trim();
    if (input.email !== undefined) changes.email = input.email.trim().toLowerCase();
    if (input.locale !== undefined) changes.locale = input.locale === null || input.locale.trim() === '' ? null : canonicalLocale(input.locale);
    if (input.emailReminders !== undefined) changes.emailReminders = input.emailReminders;
    if (input.emailReceipts !== undefined) changes.emailReceipts = input.emailReceipts;
    if (input.isAdmin !== undefined) changes.isAdmin = input.isAdmin;
    if (input.isActive !== undefined) changes.isActive = input.isActive;
    await this.sequelize.transaction(async (transaction) => {
      await user.update(changes, { transaction });
      if (input.isActive === false) await this.sessions.revokeAll(user.id, 'deactivated', transaction);
    });
    return toPublicUser(user);
  }
}
