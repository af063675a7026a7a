export function FormAlert({ message, tone = 'danger' }: { message?: string; tone?: 'danger' | 'ok' }) {
  if (!message) return null;
  const styles = tone === 'danger' ? 'bg-danger-soft text-danger' : 'bg-glow-soft text-ink';
  return (
    <p role={tone === 'danger' ? 'alert' : 'status'} className={`rounded-lg px-3 py-2 font-semibold ${styles}`}>
      {message}
    </p>
  );
}
