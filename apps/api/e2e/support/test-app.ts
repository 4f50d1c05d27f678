import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { getConnectionToken } from '@nestjs/sequelize';
import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import type { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/bootstrap';
import { User } from '../../src/users/models/user.model';
import { checkResponsesAgainstOpenApi } from './response-contract';

export const TEST_PASSWORD = 'correct horse battery';

export interface TestApp {
  app: NestExpressApplication;
  http: ReturnType<typeof request>;
  sequelize: Sequelize;
  close(): Promise<void>;
}

/** The whole API, configured as main.ts does, on the real test database. */
export async function createTestApp(): Promise<TestApp> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'], bodyParser: false });
  configureApp(app);
  checkResponsesAgainstOpenApi(app);
  await app.init();
  const sequelize = app.get<Sequelize>(getConnectionToken());
  return { app, http: request(app.getHttpServer()), sequelize, close: () => app.close() };
}

/** The whole API created with these environment variables set (undefined: unset), which are put back afterwards. */
export async function createTestAppWith(variables: Record<string, string | undefined>): Promise<TestApp> {
  const saved = Object.fromEntries(Object.keys(variables).map((name) => [name, process.env[name]]));
  const apply = (values: Record<string, string | undefined>) => {
    for (const [name, value] of Object.entries(values)) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  };
  apply(variables);
  try {
    return await createTestApp();
  } finally {
    apply(saved);
  }
}

// One hash for every test person keeps bcrypt out of the test time.
const passwordHash = bcrypt.hashSync(TEST_PASSWORD, 4);

/** A person written straight to the database, with a unique e-mail. */
export async function createPerson(options: { isAdmin?: boolean; name?: string } = {}): Promise<User> {
  const tag = randomUUID().slice(0, 8);
  return User.create({
    email: `e2e-${tag}@example.org`,
    name: options.name ?? `Test person ${tag}`,
    passwordHash,
    isAdmin: options.isAdmin ?? false,
    isActive: true,
  });
}

export async function tokenFor(testApp: TestApp, user: Pick<User, 'email'>): Promise<string> {
  const response = await testApp.http.post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
  if (response.status !== 200) throw new Error(`login for ${user.email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  return response.body.accessToken as string;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
