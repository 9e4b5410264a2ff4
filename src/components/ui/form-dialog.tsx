// A dialog holding one small form with Cancel and Save; a refused save shows its reason and keeps the input.
import { useState, type FormEvent, type ReactNode } from 'react';
import { errorMessage } from '../../lib/api';
import { Button } from './button';
import { Dialog } from './dialog';
import { Notice } from './layout';

/**
 * A dialog holding one small form: Cancel and Save at its foot; Save runs `onSave` and closes the
 * dialog, or shows the refusal above the buttons and keeps what was typed.
 */
export function FormDialog({
  title,
  onClose,
  onSave,
  children,
  saveLabel = 'Save',
}: {
  title: string;
  onClose: () => void;
  onSave: () => Promise<void>;
  children: ReactNode;
  saveLabel?: string;
}) {
  const [error, setError] = useState<string | null>(null);
  const submit = async (e: FormEvent) => {
    e.preventDefault();
    try {
      await onSave();
      onClose();
    } catch (err) {
      setError(errorMessage(err));
    }
  };
  return (
    <Dialog open onClose={onClose} title={title}>
      <form onSubmit={submit} className="flex flex-col gap-4">
        {children}
        {error && <Notice tone="error">{error}</Notice>}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary">
            {saveLabel}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
