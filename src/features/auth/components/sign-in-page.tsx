// The sign-in page: e-mail and password, then on to the page the visitor asked for (or Projects).
import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/layout';
import { ApiError, fieldError } from '../../../lib/api';
import { useSignIn } from '../api/session';
import { safeNextPath } from '../../../lib/next-path';
import { AuthFrame } from './auth-frame';

export function SignInPage() {
  const signIn = useSignIn();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');

  const submit = (e: FormEvent) => {
    e.preventDefault();
    signIn.mutate({ email, password }, { onSuccess: () => navigate(safeNextPath(params.get('next')), { replace: true }) });
  };
  const err = signIn.error;
  const general = err instanceof ApiError && Object.keys(err.fields).length === 0 ? err.message : null;

  return (
    <AuthFrame
      title="Sign in"
      subtitle="Welcome back to your studio."
      footer={
        <>
          New to Parlour?{' '}
          <Link className="font-semibold text-pine underline-offset-2 hover:underline" to="/sign-up">
            Create a studio
          </Link>
        </>
      }
    >
      <form onSubmit={submit} className="flex flex-col gap-5" noValidate>
        {general && <Notice tone="error">{general}</Notice>}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={fieldError(err, 'email')}
          required
          autoFocus
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={fieldError(err, 'password')}
          required
        />
        <Button type="submit" variant="primary" busy={signIn.isPending}>
          Sign in
        </Button>
      </form>
    </AuthFrame>
  );
}
