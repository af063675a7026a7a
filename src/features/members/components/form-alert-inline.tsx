export function FormAlertInline({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p role="alert" className="mt-2 rounded-lg bg-danger-soft px-3 py-2 text-sm font-semibold text-danger">
      {message}
    </p>
  );
}
