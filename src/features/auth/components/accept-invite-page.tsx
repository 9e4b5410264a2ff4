// The invitation page: shows the studio and role a member was invited to, and joins with a name and password.
import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice, Spinner } from '../../../components/ui/layout';
import { ApiError, errorMessage, fieldError } from '../../../lib/api';
import { inviteQuery, useAcceptInvite } from '../api/session';
import { NEW_PASSWORD_HINT } from '../../../../shared/schemas/password-rule';
import { AuthFrame } from './auth-frame';

export function AcceptInvitePage() {
  const { token = '' } = useParams();
  const invite = useQuery(inviteQuery(token));
  const accept = useAcceptInvite(token);
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');

  if (invite.isPending)
    return (
      <AuthFrame title="Invitation">
        <Spinner />
      </AuthFrame>
    );
  if (invite.isError) {
    return (
      <AuthFrame
        title="Invitation"
        footer={
          <Link className="font-semibold text-pine" to="/sign-in">
            Go to sign in
          </Link>
        }
      >
        <Notice tone="error">{errorMessage(invite.error)}</Notice>
      </AuthFrame>
    );
  }
  const info = invite.data.invite;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    accept.mutate({ name, password }, { onSuccess: () => navigate('/projects', { replace: true }) });
  };
  const err = accept.error;
  const general = err instanceof ApiError && Object.keys(err.fields).length === 0 ? err.message : null;
  return (
    <AuthFrame
      title={`Join ${info.studioName ?? 'the studio'}`}
      subtitle={
        <>
          You were invited as <strong>{info.role}</strong> with {info.email}.
        </>
      }
    >
      <form onSubmit={submit} className="flex flex-col gap-5" noValidate>
        {general && <Notice tone="error">{general}</Notice>}
        <TextField
          label="Your name"
          autoComplete="name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError(err, 'name')}
          autoFocus
        />
        <TextField
          label="Choose a password"
          type="password"
          autoComplete="new-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={fieldError(err, 'password')}
          hint={NEW_PASSWORD_HINT}
        />
        <Button type="submit" variant="primary" busy={accept.isPending}>
          Accept and join
        </Button>
      </form>
    </AuthFrame>
  );
}
