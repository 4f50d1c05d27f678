export declare function testObjectStoreEnv(base: Record<string, string | undefined>): { S3_ENDPOINT: string; S3_BUCKET: string; S3_DATA_DIR: string };
export declare function localObjectStorePort(env: Record<string, string | undefined>): number | null;
export declare function isListening(port: number): Promise<boolean>;
export declare function startObjectStore(env: Record<string, string | undefined>, options?: { quiet?: boolean }): Promise<{ close(): Promise<void>; port: number | null }>;
