import { Field, inputClass } from '../../../components/field';

/** A labelled free-text field (a code, a valve name, a line-up) with an optional message in words. */
export function TextInput({
  label,
  value,
  onChange,
  placeholder,
  hint,
  error,
  capitals = false,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  placeholder?: string;
  hint?: string;
  error?: string;
  capitals?: boolean;
}) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(a) => (
        <input
          {...a}
          type="text"
          value={value}
          onChange={(event) => onChange(event.target.value)}
          placeholder={placeholder}
          className={`${inputClass} font-mono`}
          autoComplete="off"
          autoCapitalize={capitals ? 'characters' : 'off'}
          autoCorrect="off"
          spellCheck={false}
        />
      )}
    </Field>
  );
}
