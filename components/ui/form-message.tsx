/** A form-level message (success or error), announced politely. */
export function FormMessage({ message, tone }: { message?: string; tone: 'error' | 'success' }) {
  if (!message) return <p aria-live="polite" className="sr-only" />;
  return (
    <p
      aria-live="polite"
      data-testid={`form-${tone}`}
      className={`rounded-md px-3 py-2 text-sm ${tone === 'error' ? 'bg-red-50 text-red-800' : 'bg-leaf-50 text-leaf-900'}`}
    >
      {message}
    </p>
  );
}
