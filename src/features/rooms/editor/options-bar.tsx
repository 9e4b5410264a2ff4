// The room editor's option tabs: switch, add, duplicate, rename, reorder and delete options.
import { useRef, useState, type ReactNode } from 'react';
import { optionLabel, type OptionRecord } from '../../../../shared/schemas/room-api';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { FormDialog } from '../../../components/ui/form-dialog';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import type { Frozen, RoomEditor } from './use-room-editor';

/** Option tabs across the top: switch, add, duplicate, rename, reorder and delete options. */
export function OptionsBar({
  editor,
  optionId,
  onChoose,
  readOnly,
  frozen,
}: {
  editor: RoomEditor;
  optionId: string;
  onChoose: (id: string) => void;
  readOnly: boolean;
  /** Options the decided project stands on: marked, and neither renamed nor deleted. */
  frozen: Frozen;
}) {
  const [dialog, setDialog] = useState<'rename' | 'delete' | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const current = editor.options.find((o) => o.id === optionId);
  const currentFrozen = frozen.optionIds.has(optionId);
  const menu = useRef<HTMLDetailsElement>(null);

  const act = async (f: () => Promise<unknown>) => {
    setBusy(true);
    setError(null);
    try {
      await f();
    } catch (err) {
      setError(errorMessage(err));
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="order-3 flex min-w-0 basis-full flex-wrap items-center gap-1 xl:order-none xl:basis-auto xl:flex-1">
      <div role="tablist" aria-label="Options" className="flex flex-wrap gap-1">
        {editor.options.map((o) => (
          <button
            key={o.id}
            role="tab"
            aria-selected={o.id === optionId}
            onClick={() => onChoose(o.id)}
            className={`${frozen.optionIds.has(o.id) ? 'max-w-80' : 'max-w-64'} truncate rounded-lg px-3 py-1.5 text-sm font-semibold text-ink-soft hover:bg-sand aria-selected:bg-pine aria-selected:text-white`}
          >
            {optionLabel(o.position, o.name)}
            {frozen.optionIds.has(o.id) && (
              <>
                {' '}
                <span className="text-xs font-medium opacity-80">· chosen</span>
              </>
            )}
          </button>
        ))}
      </div>
      {!readOnly && current && (
        <>
          <Button size="sm" variant="quiet" busy={busy} onClick={() => act(async () => onChoose(await editor.addOption()))}>
            + New option
          </Button>
          <details className="relative" ref={menu}>
            <summary className="flex h-8 cursor-pointer list-none items-center rounded-lg px-3 text-sm font-semibold whitespace-nowrap text-ink-soft hover:bg-sand">
              This option ▾
            </summary>
            <div
              className="absolute left-0 z-20 mt-1 flex w-52 flex-col rounded-xl border border-line bg-white p-1 shadow-lg"
              onClick={() => menu.current?.removeAttribute('open')}
            >
              <MenuItem onClick={() => act(async () => onChoose(await editor.addOption(optionId)))}>Duplicate option</MenuItem>
              <MenuItem disabled={currentFrozen} onClick={() => setDialog('rename')}>
                Rename option
              </MenuItem>
              <MenuItem disabled={current.position === 0} onClick={() => act(() => editor.moveOption(optionId, -1))}>
                Move left
              </MenuItem>
              <MenuItem
                disabled={current.position === editor.options.length - 1}
                onClick={() => act(() => editor.moveOption(optionId, 1))}
              >
                Move right
              </MenuItem>
              <MenuItem disabled={editor.options.length <= 1 || currentFrozen} onClick={() => setDialog('delete')} danger>
                Delete option
              </MenuItem>
            </div>
          </details>
        </>
      )}
      {error && (
        <div className="w-full">
          <Notice tone="error">{error}</Notice>
        </div>
      )}
      {dialog === 'rename' && current && <RenameOption option={current} editor={editor} onClose={() => setDialog(null)} />}
      {dialog === 'delete' && current && (
        <Dialog
          open
          onClose={() => setDialog(null)}
          title={`Delete ${optionLabel(current.position, current.name)}?`}
          footer={
            <>
              <Button variant="quiet" onClick={() => setDialog(null)}>
                Keep it
              </Button>
              <Button
                variant="danger"
                onClick={() =>
                  act(async () => {
                    const next = editor.options.find((o) => o.id !== current.id);
                    await editor.deleteOption(current.id);
                    if (next) onChoose(next.id);
                    setDialog(null);
                  })
                }
              >
                Delete option
              </Button>
            </>
          }
        >
          <p className="text-ink-soft">
            Its pieces and finishes go with it. The room’s walls and openings stay, as they belong to every option.
          </p>
        </Dialog>
      )}
    </div>
  );
}

function MenuItem({
  children,
  onClick,
  disabled,
  danger,
}: {
  children: ReactNode;
  onClick: () => void;
  disabled?: boolean;
  danger?: boolean;
}) {
  return (
    <button
      type="button"
      disabled={disabled}
      onClick={onClick}
      className={`rounded-lg px-3 py-2 text-left text-sm font-semibold hover:bg-sand disabled:text-ink-faint disabled:hover:bg-transparent ${danger ? 'text-clay' : 'text-ink'}`}
    >
      {children}
    </button>
  );
}

function RenameOption({ option, editor, onClose }: { option: OptionRecord; editor: RoomEditor; onClose: () => void }) {
  const [name, setName] = useState(option.name);
  const [note, setNote] = useState(option.note);
  return (
    <FormDialog
      title="Name this option"
      onClose={onClose}
      onSave={() => editor.saveOptionMeta(option.id, { name: name.trim(), note })}
    >
      <TextField
        label="Name"
        value={name}
        onChange={(e) => setName(e.target.value)}
        placeholder="e.g. Calm and light"
        hint="The client sees it beside the option’s letter."
        autoFocus
      />
      <TextAreaField
        label="Note for the client"
        value={note}
        onChange={(e) => setNote(e.target.value)}
        hint="A line or two on what this option is about."
      />
    </FormDialog>
  );
}
