import { LabelledSwitch } from '../../../components/labelled-switch';

/** Whether the owner sees this photo. */
export function ShareSwitch({
  checked,
  onChange,
  disabled,
}: {
  checked: boolean;
  onChange: (next: boolean) => void;
  disabled?: boolean;
}) {
  return (
    <LabelledSwitch
      label="Share with owner"
      hint={checked ? 'The owner can see this photo.' : 'Only the team can see this photo.'}
      checked={checked}
      onChange={onChange}
      disabled={disabled}
    />
  );
}
