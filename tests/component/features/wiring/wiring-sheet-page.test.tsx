import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { afterEach, describe, expect, it } from 'vitest';
import type { RobotDetail } from '@shared/schemas/robots';
import { WiringSheetPage } from '@/features/wiring/components/wiring-sheet-page';
import { esp32Plan, unoPlan } from '../../../fixtures/pin-plans';
import { revisionOf, robotOf } from './render-wiring';

const realFetch = globalThis.fetch;
afterEach(() => {
  globalThis.fetch = realFetch;
});

/** Answers the robot and revision endpoints; anything else is a 404. */
function serve(routes: Record<string, unknown>): string[] {
  const asked: string[] = [];
  globalThis.fetch = (async (url: string) => {
    asked.push(url);
    const body = routes[url];
    if (body === undefined)
      return new Response(JSON.stringify({ error: { code: 'not_found', message: 'Not found' } }), {
        status: 404,
        headers: { 'Content-Type': 'application/json' },
      });
    return new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } });
  }) as typeof fetch;
  return asked;
}

const head = unoPlan();
const detail: RobotDetail = { robot: robotOf(head), head: revisionOf(head, 3) };

function renderPage(revision: number | null, badRevision?: string) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <WiringSheetPage
          robotId="robot-7"
          revision={revision}
          badRevision={badRevision}
          backTo="/teams/team-2/robots/robot-7"
        />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('the wiring sheet page', () => {
  it('shows the head revision when no revision is asked for', async () => {
    const asked = serve({ '/api/robots/robot-7': detail });
    renderPage(null);
    expect(await screen.findByRole('table', { name: 'Pins on the Uno' })).toBeTruthy();
    expect(asked).toEqual(['/api/robots/robot-7']);
    expect(screen.getByRole('button', { name: 'Print' })).toHaveProperty('disabled', false);
  });

  it('reads an older revision from its own endpoint', async () => {
    const older = revisionOf(esp32Plan(), 2);
    const asked = serve({ '/api/robots/robot-7': detail, '/api/robots/robot-7/revisions/2': { revision: older } });
    renderPage(2);
    expect(await screen.findByRole('table', { name: 'Pins on the ESP32 DevKitC' })).toBeTruthy();
    expect(asked).toContain('/api/robots/robot-7/revisions/2');
  });

  it('says so when the revision does not exist', async () => {
    serve({ '/api/robots/robot-7': detail });
    renderPage(9);
    expect((await screen.findByRole('alert')).textContent).toContain('Revision 9 of this robot does not exist.');
  });

  it('refuses a revision that is not a whole number and offers nothing to print', () => {
    serve({ '/api/robots/robot-7': detail });
    renderPage(null, 'latest');
    expect(screen.getByRole('alert').textContent).toContain('“latest” is not a revision number');
    expect(screen.getByRole('button', { name: 'Print' })).toHaveProperty('disabled', true);
  });
});
