// The sign-up page: creates a studio with its first member as owner, then opens Projects.
import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/layout';
import { ApiError, fieldError } from '../../../lib/api';
import { useSignUp } from '../api/session';
import { NEW_PASSWORD_HINT } from '../../../../shared/schemas/password-rule';
import { AuthFrame } from './auth-frame';

export function SignUpPage() {
  const signUp = useSignUp();
  const navigate = useNavigate();
  const [form, setForm] = useState({ studioName: '', name: '', email: '', password: '' });
  const set = (k: keyof typeof form) => (e: { target: { value: string } }) => setForm((f) => ({ ...f, [k]: e.target.value }));

  const submit = (e: FormEvent) => {
    e.preventDefault();
    signUp.mutate(form, { onSuccess: () => navigate('/projects', { replace: true }) });
  };
  const err = signUp.error;
  const general = err instanceof ApiError && Object.keys(err.fields).length === 0 ? err.message : null;

  return (
    <AuthFrame
      title="Create your studio"
      subtitle="You will be its owner and can invite your team afterwards."
      footer={
        <>
          Already have an account?{' '}
          <Link className="font-semibold text-pine underline-offset-2 hover:underline" to="/sign-in">
            Sign in
          </Link>
        </>
      }
    >
      <form onSubmit={submit} className="flex flex-col gap-5" noValidate>
        {general && <Notice tone="error">{general}</Notice>}
        <TextField
          label="Studio name"
          value={form.studioName}
          onChange={set('studioName')}
          error={fieldError(err, 'studioName')}
          autoFocus
        />
        <TextField
          label="Your name"
          autoComplete="name"
          value={form.name}
          onChange={set('name')}
          error={fieldError(err, 'name')}
        />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          value={form.email}
          onChange={set('email')}
          error={fieldError(err, 'email')}
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="new-password"
          value={form.password}
          onChange={set('password')}
          error={fieldError(err, 'password')}
          hint={NEW_PASSWORD_HINT}
        />
        <Button type="submit" variant="primary" busy={signUp.isPending}>
          Create studio
        </Button>
      </form>
    </AuthFrame>
  );
}
