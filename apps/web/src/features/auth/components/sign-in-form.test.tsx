import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { SignInForm } from './sign-in-form';

function renderForm() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={queryClient}>
      <SignInForm />
    </QueryClientProvider>,
  );
}

function fillIn(email: string, password: string) {
  fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: email } });
  fireEvent.change(screen.getByLabelText('Password'), { target: { value: password } });
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('SignInForm', () => {
  it('shows a message beside a malformed e-mail and an empty password without calling the API', () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderForm();

    fillIn('ada-at-example', '');

    const email = screen.getByRole('textbox', { name: 'E-mail', description: /must be an e-mail address/ });
    expect(email.getAttribute('aria-invalid')).toBe('true');
    expect(document.activeElement).toBe(email);
    expect(screen.getByText('password is required')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("shows the server's message when it refuses the credentials", async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        Response.json({ error: { code: 'unauthenticated', message: 'wrong e-mail or password' } }, { status: 401 }),
      ),
    );
    renderForm();

    fillIn('ada@example.org', 'not-her-password');

    expect((await screen.findByRole('alert')).textContent).toBe('wrong e-mail or password');
  });

  it("shows the server's field messages beside their fields", async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        Response.json(
          {
            error: {
              code: 'validation_failed',
              message: 'the request body is not valid',
              fields: { password: 'password must have at most 200 characters' },
            },
          },
          { status: 400 },
        ),
      ),
    );
    renderForm();

    fillIn('ada@example.org', 'x');

    await screen.findByText('password must have at most 200 characters');
    expect(screen.getByLabelText('Password').getAttribute('aria-invalid')).toBe('true');
  });
});
