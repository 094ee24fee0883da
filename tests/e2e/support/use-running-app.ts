import { afterAll, beforeAll, inject } from 'vitest';
import { startApp, type RunningApp } from './app-server';
import { openBrowser, type Browser } from './browser';

type BrowserOptions = Parameters<typeof openBrowser>[0];

/**
 * The built app on its own port and one browser per person named (each with its own profile),
 * started before the file's tests and closed after them. Read the fields inside tests, not at
 * the top of the file: they are filled in by the time the first test runs.
 */
export function useRunningApp<Person extends string>(
  people: Record<Person, BrowserOptions>,
): { app: RunningApp } & Record<Person, Browser> {
  const names = Object.keys(people) as Person[];
  const running = {} as { app: RunningApp } & Record<Person, Browser>;
  beforeAll(async () => {
    running.app = await startApp({ client: inject('clientDir') });
    const browsers = await Promise.all(names.map((name) => openBrowser(people[name])));
    names.forEach((name, i) => Object.assign(running, { [name]: browsers[i] }));
  });
  afterAll(async () => {
    await Promise.all(names.map((name) => (running[name] as Browser | undefined)?.close()));
    await running.app?.close();
  });
  return running;
}
