import { useState } from 'react';
import { Field, inputClass } from '../../../components/field';
import type { Checked } from './finding-edit';

/**
 * A text value saved when the person leaves the field or presses Enter; Escape puts back what was there.
 * While not being edited it shows `value`, so an optimistic change and its rollback both show here.
 */
export function InlineTextField({
  label,
  value,
  hint,
  mono = false,
  check,
  onSave,
  onDraft,
}: {
  label: string;
  value: string;
  hint?: string;
  mono?: boolean;
  check: (raw: string) => Checked;
  onSave: (next: string) => void;
  /** What is being typed, or null when the field shows `value` again. */
  onDraft?: (draft: string | null) => void;
}) {
  const [draft, setDraftState] = useState<string | null>(null);
  const setDraft = (next: string | null) => {
    setDraftState(next);
    onDraft?.(next);
  };
  const [error, setError] = useState<string>();

  function commit() {
    if (draft === null) return;
    const result = check(draft);
    if (!result.ok) return setError(result.message);
    setError(undefined);
    setDraft(null);
    if (result.value !== value) onSave(result.value);
  }

  return (
    <Field label={label} hint={hint} error={error}>
      {(a) => (
        <input
          {...a}
          value={draft ?? value}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              commit();
            } else if (e.key === 'Escape' && draft !== null) {
              e.preventDefault();
              setDraft(null);
              setError(undefined);
            }
          }}
          autoComplete="off"
          spellCheck={!mono}
          className={`${inputClass} ${mono ? 'font-mono' : ''}`}
        />
      )}
    </Field>
  );
}
