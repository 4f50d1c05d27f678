import type { PublicUser } from '@friable/contracts';
import type { User } from './models/user.model';

export type { PublicUser };

export function toPublicUser(user: User): PublicUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    isAdmin: user.isAdmin,
    isActive: user.isActive,
    createdAt: user.createdAt.toISOString(),
    locale: user.locale ?? null,
    emailReminders: user.emailReminders ?? true,
    emailReceipts: user.emailReceipts ?? true,
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
  };
}
