export interface AppConfig {
  nodeEnv: 'development' | 'production' | 'test';
  host: string;
  port: number;
  /** The address people reach the app at; used in e-mailed links. */
  publicUrl: string;
  /** Folder of the built web app that the server serves beside `/api`. */
  frontendDist: string;
  logLevel: 'error' | 'warn' | 'log' | 'debug' | 'verbose';
  version: string;
}

export interface DatabaseConfig {
  url: string;
  poolSize: number;
}

/** Every config namespace, for `ConfigService<AllConfigType>` with `{ infer: true }`. */
export interface AllConfigType {
  app: AppConfig;
  database: DatabaseConfig;
}
