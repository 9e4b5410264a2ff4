// The fields of a paint finish: colour (picker and hex kept in step) and sheen.
import { SHEENS, type Sheen } from '../../../../shared/schemas/finish';
import { CommitTextField } from '../../../components/ui/commit-field';
import { inputClass, SelectField, TextField } from '../../../components/ui/field';
import type { CommitAnswer } from '../../../components/ui/use-commit-text';
import { SHEEN_LABELS } from './finish-labels';

const HEX = /^#[0-9a-fA-F]{6}$/;

/** Colour (picker and hex, kept in step) and sheen of a paint. */
export function PaintFields({
  colourHex,
  sheen,
  onColour,
  onSheen,
  colourError,
  disabled = false,
  commitColour,
}: {
  colourHex: string;
  sheen: Sheen;
  /** Every change as it is made (a form's state, or a preview). */
  onColour: (hex: string) => void;
  /**
   * For a saved paint: the colour is committed like the editor's fields (the hex on Enter, on
   * leaving it, Escape reverts; the picker when it closes) and `colourHex` is the saved value.
   */
  commitColour?: (hex: string) => Promise<CommitAnswer>;
  onSheen: (sheen: Sheen) => void;
  colourError?: string;
  disabled?: boolean;
}) {
  return (
    <div className="grid grid-cols-[auto_minmax(0,1fr)_minmax(0,1fr)] items-start gap-3">
      <label className="flex flex-col gap-1.5">
        <span className="text-sm font-semibold text-ink">Colour</span>
        <input
          type="color"
          aria-label="Colour picker"
          value={HEX.test(colourHex) ? colourHex.toLowerCase() : '#ffffff'}
          onChange={(e) => onColour(e.target.value)}
          onBlur={commitColour && ((e) => e.target.value !== colourHex.toLowerCase() && void commitColour(e.target.value))}
          disabled={disabled}
          className={`${inputClass} w-14 cursor-pointer p-1`}
        />
      </label>
      {commitColour ? (
        <CommitTextField
          label="Hex"
          value={colourHex}
          format={(v) => v}
          parse={(text) =>
            HEX.test(text.trim())
              ? { ok: true, value: text.trim() }
              : { ok: false, message: 'A colour is # and six digits or letters a–f.' }
          }
          equal={(a, b) => a.toLowerCase() === b.toLowerCase()}
          onCommit={commitColour}
          disabled={disabled}
        />
      ) : (
        <TextField
          label="Hex"
          value={colourHex}
          onChange={(e) => onColour(e.target.value.trim())}
          error={colourError}
          maxLength={7}
          spellCheck={false}
          disabled={disabled}
        />
      )}
      <SelectField label="Sheen" value={sheen} onChange={(e) => onSheen(e.target.value as Sheen)} disabled={disabled}>
        {SHEENS.map((s) => (
          <option key={s} value={s}>
            {SHEEN_LABELS[s]}
          </option>
        ))}
      </SelectField>
    </div>
  );
}
