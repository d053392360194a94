import { useEffect, useRef, useState, type FormEvent } from 'react';
import { fieldErrors, loginRequestSchema, type LoginRequest } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { ApiRequestError } from '../../../lib/api-client';
import { useLogin } from '../api/login';

type Field = keyof LoginRequest;

/** Props of SignInForm. */
export interface SignInFormProps {
  /** Values to start with, e.g. a demo account chosen beside the form. */
  initialValues?: LoginRequest;
  /** Focus the submit button on mount, so that Enter signs in with the values just filled in. */
  focusSubmit?: boolean;
}

/**
 * The sign-in form: checks the fields with the shared login schema before calling the API, shows a
 * message beside each wrong field and the server's answer when it refuses. On success the session
 * query holds the user; the page decides where to go.
 */
export function SignInForm({ initialValues, focusSubmit = false }: SignInFormProps) {
  const [values, setValues] = useState<LoginRequest>(initialValues ?? { email: '', password: '' });
  const [clientErrors, setClientErrors] = useState<Partial<Record<Field, string>>>({});
  const login = useLogin();
  const inputs = { email: useRef<HTMLInputElement>(null), password: useRef<HTMLInputElement>(null) };
  const submitRef = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (focusSubmit) submitRef.current?.focus();
  }, [focusSubmit]);

  const serverFields = login.error instanceof ApiRequestError ? login.error.fields : undefined;
  const errorFor = (field: Field) => clientErrors[field] ?? serverFields?.[field];

  function change(field: Field, value: string) {
    setValues((previous) => ({ ...previous, [field]: value }));
    setClientErrors(({ [field]: _dropped, ...rest }) => rest);
    if (login.isError) login.reset();
  }

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (login.isPending) return;
    login.reset();
    const parsed = loginRequestSchema.safeParse(values);
    if (!parsed.success) {
      const errors = fieldErrors(parsed.error) as Partial<Record<Field, string>>;
      setClientErrors(errors);
      const firstInvalid = (['email', 'password'] as const).find((field) => errors[field]);
      if (firstInvalid) inputs[firstInvalid].current?.focus();
      return;
    }
    setClientErrors({});
    login.mutate(parsed.data);
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      <TextField
        ref={inputs.email}
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        inputMode="email"
        spellCheck={false}
        required
        value={values.email}
        onChange={(event) => change('email', event.target.value)}
        error={errorFor('email')}
      />
      <TextField
        ref={inputs.password}
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        required
        value={values.password}
        onChange={(event) => change('password', event.target.value)}
        error={errorFor('password')}
      />
      {login.error && (
        <div role="alert" className="rounded-md border border-alarm/40 bg-alarm-wash px-3 py-2 text-sm text-alarm">
          {login.error.message}
        </div>
      )}
      <Button ref={submitRef} type="submit" variant="primary" disabled={login.isPending} className="w-full">
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
