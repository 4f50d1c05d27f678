import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import bcrypt from 'bcryptjs';
import type { CreateUserDto } from './dto/create-user.dto';
import { User } from './models/user.model';
import { toPublicUser, type PublicUser } from './public-user';

@Injectable()
export class UsersService {
  constructor(@InjectModel(User) private readonly users: typeof User) {}

  async list(): Promise<PublicUser[]> {
    const users = await this.users.findAll({ order: [['name', 'ASC']] });
    return users.map(toPublicUser);
  }

  async create(input: CreateUserDto): Promise<PublicUser> {
    const user = await this.users.create({
      email: input.email.trim().toLowerCase(),
      name: input.name.trim(),
      passwordHash: await bcrypt.hash(input.password, 10),
      isAdmin: input.isAdmin ?? false,
      isActive: true,
    });
    return toPublicUser(user);
  }

  async setActive(userId: number, isActive: boolean, actingUserId: number): Promise<PublicUser> {
    const user = await this.users.findByPk(userId);
    if (!user) throw new NotFoundException(`No person with id ${userId}.`);
    if (!isActive && user.id === actingUserId) {
      throw new BadRequestException('You cannot deactivate your own account.');
    }
    user.isActive = isActive;
    await user.save();
    return toPublicUser(user);
  }
}
