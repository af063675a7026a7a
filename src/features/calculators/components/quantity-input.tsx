import { useId } from 'react';
import { Field, inputClass } from '../../../components/field';
import type { QuantityField } from '../hooks/use-quantity';

/**
 * A labelled value field read with parseQuantity: the library's message shows beside it when the
 * text cannot be read, and a quiet "reads as" line confirms the prefix otherwise (15m is milli).
 */
export function QuantityInput({
  label,
  field,
  placeholder,
  hint,
}: {
  label: string;
  field: QuantityField;
  placeholder?: string;
  hint?: string;
}) {
  const readsId = useId();
  const showReading = field.display !== undefined && field.error === undefined;
  return (
    <div>
      <Field label={label} hint={hint} error={field.error}>
        {(a) => (
          <input
            {...a}
            aria-describedby={
              [a['aria-describedby'], showReading ? readsId : undefined].filter(Boolean).join(' ') || undefined
            }
            type="text"
            value={field.text}
            onChange={(event) => field.setText(event.target.value)}
            placeholder={placeholder}
            className={`${inputClass} font-mono`}
            autoComplete="off"
            autoCapitalize="off"
            autoCorrect="off"
            spellCheck={false}
          />
        )}
      </Field>
      {showReading && (
        <p id={readsId} className="mt-1 font-mono text-xs text-ink-soft">
          reads as {field.display}
        </p>
      )}
    </div>
  );
}
