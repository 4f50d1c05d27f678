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

/** A supertest parser that keeps a binary answer (a workbook, a photo) as its bytes: `.buffer(true).parse(binaryBody)`. */
export function binaryBody(response: NodeJS.ReadableStream, done: (error: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
}

const versionedPath = /^\/api\/trials\/(\d+)(?:\/(treatments|measures|rounds|sites)\/(\d+))?$/;

/**
 * The version a client would send with a PATCH of `path` (a trial or one of its treatments, measures, rounds or
 * sites): read from GET /api/trials/:trialId as `auth` sees it; 1 when `auth` may not read the trial.
 */
export async function currentVersion(testApp: TestApp, path: string, auth: Record<string, string>): Promise<number> {
  const match = versionedPath.exec(path);
  if (!match) throw new Error(`${path} is not a versioned protocol record`);
  const detail = await testApp.http.get(`/api/trials/${match[1]}`).set(auth);
  // A trial the reader may not see has no version to read (the PATCH is refused for that anyway); a failing read must not pass for version 1.
  if (detail.status >= 500) throw new Error(`reading the version of ${path} answered ${detail.status}: ${JSON.stringify(detail.body)}`);
  if (detail.status !== 200) return 1;
  if (!match[2]) return detail.body.version as number;
  const row = (detail.body[match[2]] as Array<{ id: number; version: number }>).find((r) => r.id === Number(match[3]));
  return row?.version ?? 1;
}

/** PATCH of a protocol record as a client sends it: with the version it has just read. */
export async function patchCurrent(testApp: TestApp, path: string, auth: Record<string, string>, body: object): Promise<request.Response> {
  const version = await currentVersion(testApp, path, auth);
  return testApp.http.patch(path).set(auth).send({ ...body, version });
}

/** PUT …/factors as a client sends it: each factor with the version of the stored factor at its place (GET …/factors). */
export async function putFactorsCurrent(testApp: TestApp, path: string, auth: Record<string, string>, body: { factors: object[] }): Promise<request.Response> {
  const stored = await testApp.http.get(path).set(auth);
  const versions = stored.status === 200 ? (stored.body as Array<{ version: number }>).map((factor) => factor.version) : [];
  return testApp.http.put(path).set(auth).send({ ...body, factors: body.factors.map((factor, index) => (index < versions.length ? { ...factor, version: versions[index] } : factor)) });
}
