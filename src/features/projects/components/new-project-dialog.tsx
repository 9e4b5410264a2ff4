// The new project dialog: name and address, and an existing client or a new one; opens the project once made.
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { SelectField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/layout';
import { ApiError, fieldError } from '../../../lib/api';
import { useCreateProject } from '../api/projects';

const NEW_CLIENT = '__new__';

export function NewProjectDialog({
  open,
  onClose,
  clients,
}: {
  open: boolean;
  onClose: () => void;
  clients: { id: string; name: string }[];
}) {
  const create = useCreateProject();
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [address, setAddress] = useState('');
  // Until the designer picks, the first client is meant (also when the list arrives after the dialog opened).
  const [chosenClient, setClientId] = useState<string | null>(null);
  const clientId = chosenClient ?? clients[0]?.id ?? NEW_CLIENT;
  const [clientName, setClientName] = useState('');
  const [clientEmail, setClientEmail] = useState('');
  const isNew = clientId === NEW_CLIENT || clients.length === 0;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(isNew ? { name, address, newClient: { name: clientName, email: clientEmail } } : { name, address, clientId }, {
      onSuccess: ({ project }) => {
        onClose();
        navigate(`/projects/${project.id}`);
      },
    });
  };
  const err = create.error;
  const general = err instanceof ApiError && Object.keys(err.fields).length === 0 ? err.message : null;

  return (
    <Dialog open={open} onClose={onClose} title="New project">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        {general && <Notice tone="error">{general}</Notice>}
        <TextField
          label="Project name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError(err, 'name')}
          placeholder="e.g. Riverside flat"
          autoFocus
        />
        <TextField
          label="Address"
          value={address}
          onChange={(e) => setAddress(e.target.value)}
          error={fieldError(err, 'address')}
          hint="Optional."
        />
        {clients.length > 0 && (
          <SelectField
            label="Client"
            value={clientId}
            onChange={(e) => setClientId(e.target.value)}
            error={fieldError(err, 'clientId')}
          >
            {clients.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
            <option value={NEW_CLIENT}>+ A new client…</option>
          </SelectField>
        )}
        {isNew && (
          <div className="grid gap-4 rounded-xl bg-paper p-4 sm:grid-cols-2">
            <TextField
              label="Client name"
              value={clientName}
              onChange={(e) => setClientName(e.target.value)}
              error={fieldError(err, 'newClient.name')}
            />
            <TextField
              label="Client e-mail"
              type="email"
              value={clientEmail}
              onChange={(e) => setClientEmail(e.target.value)}
              error={fieldError(err, 'newClient.email')}
              hint="For presentations."
            />
          </div>
        )}
        <div className="mt-2 flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={create.isPending}>
            Create project
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
