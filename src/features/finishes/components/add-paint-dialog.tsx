// The Add paint dialog of the finish library: name, colour and sheen, supplier, code and price.
import { useState, type FormEvent } from 'react';
import { PRICE_UNITS, type Sheen } from '../../../../shared/schemas/finish';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { SelectField, TextField } from '../../../components/ui/field';
import { numberParser } from '../../../components/ui/use-commit-text';
import { Notice } from '../../../components/ui/layout';
import { ApiError, errorMessage, fieldError } from '../../../lib/api';
import { useCreatePaint } from '../api/finishes';
import { PRICE_UNIT_CHOICES } from './finish-labels';
import { PaintFields } from './paint-fields';

const readPrice = numberParser({ min: 0, optional: true, what: 'a price' });
type PaintUnit = (typeof PRICE_UNITS.paint)[number];

export function AddPaintDialog({ onClose }: { onClose: () => void }) {
  const create = useCreatePaint();
  const [name, setName] = useState('');
  const [colourHex, setColourHex] = useState('#e6dcc8');
  const [sheen, setSheen] = useState<Sheen>('matt');
  const [supplier, setSupplier] = useState('');
  const [code, setCode] = useState('');
  const [price, setPrice] = useState('');
  const [priceUnit, setPriceUnit] = useState<PaintUnit>('litre');
  const [priceError, setPriceError] = useState<string | undefined>();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const read = readPrice(price);
    if (!read.ok) {
      setPriceError(read.message);
      return;
    }
    setPriceError(undefined);
    create.mutate(
      { name, colourHex, sheen, supplier, code, price: read.value, priceUnit: read.value === null ? null : priceUnit },
      { onSuccess: onClose },
    );
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
        <div className="grid grid-cols-[minmax(0,1fr)_auto] gap-3">
          <TextField
            label="Price"
            value={price}
            inputMode="decimal"
            onChange={(e) => setPrice(e.target.value)}
            error={priceError ?? fieldError(err, 'price')}
            hint="Optional. Per litre, the schedule prices the tins to buy; per m², the painted wall."
          />
          <SelectField label="Per" value={priceUnit} onChange={(e) => setPriceUnit(e.target.value as PaintUnit)}>
            {PRICE_UNITS.paint.map((u) => (
              <option key={u} value={u}>
                {PRICE_UNIT_CHOICES[u]}
              </option>
            ))}
          </SelectField>
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
