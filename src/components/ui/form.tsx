import type { InputHTMLAttributes, ReactNode } from 'react';
import { forwardRef } from 'react';
import { useFormat } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';

/** Why a value is refused, in the language on screen (a shared schema's English sentence is looked up). */
export function FieldError({ children, id, className = '' }: { children: string; id?: string; className?: string }) {
  useTranslation(); // shown again when the language changes
  const settings = useFormat().settings;
  return (
    <p id={id} className={`field-error ${className}`.trim()}>
      {localSentence(children, settings)}
    </p>
  );
}

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
      {error ? <FieldError>{error}</FieldError> : null}
    </div>
  );
});
