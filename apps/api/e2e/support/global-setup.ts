// Before the end-to-end files run: the tests' object store (s3rver on TEST_S3_PORT, bucket friable-test), unless
// npm test already started it. Stopped again after the last file.
import { loadEnvironment } from '../../../devstack/src/env.mjs';
import { startObjectStore, testObjectStoreEnv } from '../../../devstack/src/object-store.mjs';

export default async function setup(): Promise<() => Promise<void>> {
  const base = loadEnvironment();
  const store = await startObjectStore(
    { ...base, ...testObjectStoreEnv(base) },
    { quiet: true },
  );
  return () => store.close();
}
