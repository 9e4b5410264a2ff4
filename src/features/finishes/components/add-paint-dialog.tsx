import { useState, type FormEvent } from 'react';
import type { Sheen } from '../../../../shared/schemas/finish';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/layout';
import { ApiError, errorMessage, fieldError } from '../../../lib/api';
import { useCreatePaint } from '../api/finishes';
import { PaintFields } from './paint-fields';

export function AddPaintDialog({ onClose }: { onClose: () => void }) {
  const create = useCreatePaint();
  const [name, setName] = useState('');
  const [colourHex, setColourHex] = useState('#e6dcc8');
  const [sheen, setSheen] = useState<Sheen>('matt');
  const [supplier, setSupplier] = useState('');
  const [code, setCode] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ name, colourHex, sheen, supplier, code }, { onSuccess: onClose });
  };
  const err = create.error;
  const general = err && !(err instanceof ApiError && Object.keys(err.fields).length > 0);
  return (
    <Dialog open onClose={onClose} title="Add paint">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        {general && <Notice tone="error">{errorMessage(err)}</Notice>}
        <TextField
          label="Name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError(err, 'name')}
          autoFocus
        />
        <PaintFields
          colourHex={colourHex}
          sheen={sheen}
          onColour={setColourHex}
          onSheen={setSheen}
          colourError={fieldError(err, 'colourHex')}
        />
        <div className="grid grid-cols-2 gap-3">
          <TextField
            label="Supplier"
            value={supplier}
            onChange={(e) => setSupplier(e.target.value)}
            error={fieldError(err, 'supplier')}
          />
          <TextField label="Code" value={code} onChange={(e) => setCode(e.target.value)} error={fieldError(err, 'code')} />
        </div>
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={create.isPending}>
            Add paint
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
