import { spawn, type ChildProcess } from 'node:child_process';
import { freePort, waitFor } from './host.ts';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

let server: ChildProcess | undefined;

export default async function setup(project: TestProject) {
  const port = await freePort();
  // Run vite's own bin with node so we can stop it by PID (an npx wrapper would leave it running).
  server = spawn(
    process.execPath,
    [
      'node_modules/vite/bin/vite.js',
      'preview',
      '--host',
      '127.0.0.1',
      '--port',
      String(port),
      '--strictPort',
    ],
    { stdio: 'ignore' },
  );
  const baseUrl = `http://127.0.0.1:${port}/`;
  await waitFor(baseUrl, 60000);
  project.provide('baseUrl', baseUrl);
  return () => {
    server?.kill();
  };
}
