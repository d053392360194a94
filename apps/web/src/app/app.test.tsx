import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import type { Mission, MissionDetail, User } from '@photon-ledger/shared';
import { Providers } from './providers';
import { createQueryClient } from './query-client';
import { routes } from './router';

const ada: User = {
  id: '0b6f2d4e-3c1a-4f7e-9d2b-5a8c6e1f4b3d',
  email: 'ada@example.org',
  displayName: 'Ada Example',
  role: 'engineer',
};

const missions: Mission[] = [
  {
    id: '7d9e1c2a-5b3f-4a6d-8e0c-1f2a3b4c5d6e',
    slug: 'corvina-2',
    name: 'Corvina 2',
    regime: 'earth-orbit',
    summary: 'A geostationary test satellite.',
    createdAt: '2025-01-14T09:30:00.000Z',
  },
  {
    id: '1a2b3c4d-5e6f-4a8b-9c0d-1e2f3a4b5c6d',
    slug: 'lantern-sail',
    name: 'Lantern Sail',
    regime: 'heliocentric',
    summary: 'A solar sail demonstrator.',
    createdAt: '2025-02-01T12:00:00.000Z',
  },
];

function json(status: number, body: unknown): Response {
  return Response.json(body, { status });
}

/** An in-memory API answering like the real one, with one account (password "right"). */
function fakeApi(signedIn: boolean) {
  let user: User | null = signedIn ? ada : null;
  return vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://localhost');
    const method = init?.method ?? 'GET';
    const path = url.pathname;
    if (path === '/api/public-config') return json(200, { demoMode: false, demoAccounts: [] });
    if (method === 'POST' && path === '/api/auth/login') {
      const body = JSON.parse(String(init?.body)) as { email: string; password: string };
      if (body.email !== ada.email || body.password !== 'right') {
        return json(401, { error: { code: 'unauthenticated', message: 'wrong e-mail or password' } });
      }
      user = ada;
      return json(200, { user });
    }
    if (method === 'POST' && path === '/api/auth/logout') {
      user = null;
      return new Response(null, { status: 204 });
    }
    if (!user) return json(401, { error: { code: 'unauthenticated', message: 'sign in first' } });
    if (path === '/api/me') return json(200, { user });
    if (path === '/api/missions') {
      const regime = url.searchParams.get('regime');
      const q = url.searchParams.get('q')?.toLowerCase() ?? '';
      const found = missions.filter((m) => (!regime || m.regime === regime) && m.name.toLowerCase().includes(q));
      return json(200, { missions: found });
    }
    const mission = missions.find((m) => path === `/api/missions/${m.id}`);
    if (mission) {
      const detail: MissionDetail = { ...mission, members: [{ userId: ada.id, displayName: ada.displayName, email: ada.email, role: 'engineer' }] };
      return json(200, detail);
    }
    return json(404, { error: { code: 'not_found', message: 'no such mission' } });
  });
}

function renderApp(path: string, signedIn: boolean) {
  vi.stubGlobal('fetch', fakeApi(signedIn));
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  render(
    <Providers queryClient={createQueryClient()}>
      <RouterProvider router={router} />
    </Providers>,
  );
  return router;
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('the web app', () => {
  it('sends a visitor without a session to sign in and, once signed in, back to the mission they asked for', async () => {
    const router = renderApp(`/missions/${missions[1]!.id}`, false);

    await screen.findByRole('heading', { name: 'Sign in to Photon Ledger' });
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: ada.email } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'right' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Lantern Sail', level: 1 })).toBeTruthy();
    expect(router.state.location.pathname).toBe(`/missions/${missions[1]!.id}`);
    const breadcrumb = screen.getByRole('navigation', { name: 'Breadcrumb' });
    expect(within(breadcrumb).getByRole('link', { name: 'Missions' })).toBeTruthy();
  });

  it('lists missions as links named after them and keeps the regime filter in the URL', async () => {
    const router = renderApp('/', true);

    await screen.findByRole('heading', { name: 'Missions' });
    expect(await screen.findByRole('link', { name: 'Corvina 2' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Lantern Sail' })).toBeTruthy();

    fireEvent.click(screen.getByRole('radio', { name: 'Heliocentric' }));

    await vi.waitFor(() => expect(screen.queryByRole('link', { name: 'Corvina 2' })).toBeNull());
    expect(router.state.location.search).toBe('?regime=heliocentric');
  });

  it('shows the not-found page for a mission that does not exist', async () => {
    renderApp('/missions/00000000-0000-4000-8000-000000000000', true);

    expect(await screen.findByRole('heading', { name: 'Mission not found' })).toBeTruthy();
  });

  it('signs out to a sign-in page that remembers nothing of the last page', async () => {
    const router = renderApp('/missions?regime=heliocentric', true);

    fireEvent.click(await screen.findByRole('button', { name: 'Sign out' }));

    await screen.findByRole('heading', { name: 'Sign in to Photon Ledger' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
  });
});
