// The Studio page: members and their roles, open invitations, the Invite a member dialog, and the
// studio's price settings (currency and locale).
import { useState, type FormEvent } from 'react';
import type { Role } from '../../../../shared/schemas/studio';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { inputClass, SelectField, TextField } from '../../../components/ui/field';
import { Badge, Card, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage, fieldError } from '../../../lib/api';
import { formatDate } from '../../../lib/format';
import { commitAnswer } from '../../../lib/api';
import { useMoney, useSession } from '../../../lib/session';
import { formatMoney } from '../../../../shared/units/money';
import { CommitTextField } from '../../../components/ui/commit-field';
import { textParser, asIs } from '../../../components/ui/use-commit-text';
import {
  useChangeRole,
  useInvite,
  useInvites,
  useMembers,
  useRemoveMember,
  useRevokeInvite,
  useUpdateStudioSettings,
} from '../api/studio';

const ROLE_HELP: Record<Role, string> = {
  owner: 'Runs the studio: members, roles and every project.',
  designer: 'Creates clients, projects and rooms; prepares and sends presentations.',
  viewer: 'Reads projects, schedules and choices; changes nothing.',
};

export function StudioPage() {
  const session = useSession();
  const isOwner = session.data?.member.role === 'owner';
  const members = useMembers();
  const invites = useInvites(isOwner);
  const changeRole = useChangeRole();
  const removeMember = useRemoveMember();
  const revoke = useRevokeInvite();
  const [inviting, setInviting] = useState(false);
  const [removing, setRemoving] = useState<{ id: string; name: string } | null>(null);

  return (
    <div>
      <PageHeader
        title={session.data?.studio.name ?? 'Studio'}
        actions={
          isOwner && (
            <Button variant="primary" onClick={() => setInviting(true)}>
              Invite a member
            </Button>
          )
        }
      >
        Members and their roles.
      </PageHeader>
      {(changeRole.isError || removeMember.isError) && (
        <div className="mb-4">
          <Notice tone="error">{errorMessage(changeRole.error ?? removeMember.error)}</Notice>
        </div>
      )}
      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <div className="flex flex-col gap-6">
          <Card title="Members">
            {members.isPending ? (
              <Spinner />
            ) : members.isError ? (
              <Notice tone="error">{errorMessage(members.error)}</Notice>
            ) : (
              <ul className="divide-y divide-line">
                {members.data.members.map((m) => (
                  <li key={m.id} className="flex flex-wrap items-center justify-between gap-3 py-3">
                    <div>
                      <div className="font-semibold">
                        {m.name}
                        {m.id === session.data?.member.id && (
                          <span className="ml-2 text-sm font-normal text-ink-faint">(you)</span>
                        )}
                      </div>
                      <div className="text-sm text-ink-soft">{m.email}</div>
                    </div>
                    {isOwner ? (
                      <div className="flex items-center gap-2">
                        <label className="sr-only" htmlFor={`role-${m.id}`}>
                          Role of {m.name}
                        </label>
                        <select
                          id={`role-${m.id}`}
                          className={`${inputClass} h-9 w-auto`}
                          value={m.role}
                          onChange={(e) => changeRole.mutate({ id: m.id, role: e.target.value as Role })}
                        >
                          <option value="owner">Owner</option>
                          <option value="designer">Designer</option>
                          <option value="viewer">Viewer</option>
                        </select>
                        {m.id !== session.data?.member.id && (
                          <Button size="sm" variant="quiet" onClick={() => setRemoving({ id: m.id, name: m.name })}>
                            Remove
                          </Button>
                        )}
                      </div>
                    ) : (
                      <Badge value={m.role} />
                    )}
                  </li>
                ))}
              </ul>
            )}
          </Card>
          {isOwner && (
            <Card title="Open invitations">
              {invites.isPending ? (
                <Spinner />
              ) : invites.data && invites.data.invites.length > 0 ? (
                <ul className="divide-y divide-line">
                  {invites.data.invites.map((i) => (
                    <li key={i.id} className="flex items-center justify-between gap-3 py-3">
                      <div>
                        <div className="font-semibold">{i.email}</div>
                        <div className="text-sm text-ink-soft">
                          {i.role} · sent {formatDate(i.createdAt)} · works until {formatDate(i.expiresAt)}
                        </div>
                      </div>
                      <Button size="sm" variant="quiet" onClick={() => revoke.mutate(i.id)}>
                        Cancel invitation
                      </Button>
                    </li>
                  ))}
                </ul>
              ) : (
                <p className="text-ink-soft">No open invitations.</p>
              )}
            </Card>
          )}
        </div>
        <div className="flex flex-col gap-6 self-start">
          <PricesCard isOwner={isOwner} />
          <Card title="Roles">
            <dl className="flex flex-col gap-4 text-[15px]">
              {(Object.keys(ROLE_HELP) as Role[]).map((r) => (
                <div key={r}>
                  <dt>
                    <Badge value={r} />
                  </dt>
                  <dd className="mt-1 text-ink-soft">{ROLE_HELP[r]}</dd>
                </div>
              ))}
            </dl>
          </Card>
        </div>
      </div>
      {inviting && <InviteDialog onClose={() => setInviting(false)} />}
      {removing && (
        <Dialog
          open
          onClose={() => setRemoving(null)}
          title={`Remove ${removing.name}?`}
          footer={
            <>
              <Button variant="quiet" onClick={() => setRemoving(null)}>
                Keep
              </Button>
              <Button variant="danger" onClick={() => removeMember.mutate(removing.id, { onSettled: () => setRemoving(null) })}>
                Remove member
              </Button>
            </>
          }
        >
          <p className="text-ink-soft">They are signed out at once and can no longer open the studio’s projects.</p>
        </Dialog>
      )}
    </div>
  );
}

function InviteDialog({ onClose }: { onClose: () => void }) {
  const invite = useInvite();
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('designer');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    invite.mutate({ email, role }, { onSuccess: onClose });
  };
  return (
    <Dialog open onClose={onClose} title="Invite a member">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <TextField
          label="E-mail"
          type="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={fieldError(invite.error, 'email')}
          autoFocus
        />
        <SelectField label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)} hint={ROLE_HELP[role]}>
          <option value="designer">Designer</option>
          <option value="viewer">Viewer</option>
          <option value="owner">Owner</option>
        </SelectField>
        {invite.isError && !fieldError(invite.error, 'email') && <Notice tone="error">{errorMessage(invite.error)}</Notice>}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={invite.isPending}>
            Send invitation
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

/** The studio's currency and locale: every price on every screen, the CSV and the client's page use them. */
function PricesCard({ isOwner }: { isOwner: boolean }) {
  const money = useMoney();
  const update = useUpdateStudioSettings();
  return (
    <Card title="Prices">
      <div className="flex flex-col gap-4">
        <div className="grid grid-cols-2 gap-3">
          <CommitTextField
            label="Currency"
            value={money.currency}
            format={asIs}
            parse={textParser('Enter a currency code.')}
            onCommit={(currency) => commitAnswer(update.mutateAsync({ currency }), 'currency')}
            hint="e.g. GBP, EUR, USD"
            disabled={!isOwner}
          />
          <CommitTextField
            label="Locale"
            value={money.locale}
            format={asIs}
            parse={textParser('Enter a locale.')}
            onCommit={(locale) => commitAnswer(update.mutateAsync({ locale }), 'locale')}
            hint="e.g. en-GB, fr-FR"
            disabled={!isOwner}
          />
        </div>
        <p className="text-sm text-ink-soft" data-testid="price-example">
          A price reads {formatMoney(1280, money)}.
        </p>
      </div>
    </Card>
  );
}
