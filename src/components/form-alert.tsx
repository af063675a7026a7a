/**
 * What went wrong with a form or an action, in the server's words (or, with tone `ok`, what went right): announced
 * to screen readers as it appears. Renders nothing without a message; `small` beside the smaller forms.
 */
export function FormAlert({
  message,
  tone = 'danger',
  small = false,
  className = '',
}: {
  message?: string | null | false;
  tone?: 'danger' | 'ok';
  small?: boolean;
  className?: string;
}) {
  if (!message) return null;
  const styles = tone === 'danger' ? 'bg-danger-soft text-danger' : 'bg-glow-soft text-ink';
  return (
    <p
      role={tone === 'danger' ? 'alert' : 'status'}
      className={`rounded-lg px-3 py-2 font-semibold ${small ? 'text-sm' : ''} ${styles} ${className}`}
    >
      {message}
    </p>
  );
}
