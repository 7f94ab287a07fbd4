/** A form-level error, announced politely; field errors sit beside their fields. */
export function FormError({ message }: { message: string | null | undefined }) {
  return (
    <div aria-live="polite" className="empty:hidden">
      {message ? (
        <p className="rounded-lg border border-berry-600 bg-berry-50 px-4 py-3 font-bold text-berry-800" data-testid="form-error">
          {message}
        </p>
      ) : null}
    </div>
  );
}
