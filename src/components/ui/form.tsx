import type { InputHTMLAttributes, ReactNode } from 'react';
import { forwardRef } from 'react';

export const Field = forwardRef<
  HTMLInputElement,
  InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: ReactNode }
>(function Field({ label, error, hint, id, ...rest }, ref) {
  const inputId = id ?? `f-${rest.name}`;
  return (
    <div>
      <label className="field-label" htmlFor={inputId}>
        {label}
      </label>
      <input ref={ref} id={inputId} className="field-input" aria-invalid={Boolean(error)} {...rest} />
      {hint && !error ? <p className="mt-1 text-xs text-ink-600">{hint}</p> : null}
      {error ? <p className="field-error">{error}</p> : null}
    </div>
  );
});
