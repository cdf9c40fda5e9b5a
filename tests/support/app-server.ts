import type { TestProject } from 'vitest/node';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';

/** vitest global setup for API and browser tests: one real app server for the run. */

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    appDataDir: string;
    appDatabaseUrl: string;
  }
}

let server: AppServer | undefined;

export async function setup(project: TestProject) {
  server = await startAppServer();
  project.provide('baseUrl', server.baseUrl);
  project.provide('appDataDir', server.dataDir);
  project.provide('appDatabaseUrl', server.databaseUrl);
}

export async function teardown() {
  server?.stop();
}
