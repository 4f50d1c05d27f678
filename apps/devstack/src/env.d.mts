export declare const repoRoot: string;
export declare function loadEnvironment(): Record<string, string>;
