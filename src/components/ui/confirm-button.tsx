import { useState } from 'react';
import { useTranslation } from '@/lib/i18n';

/**
 * A button for an action that cannot be taken back (approve pay, send money): the first press asks the
 * question in place, with the amount, and only "Yes" acts. No browser dialog, so it works the same on a phone.
 */
export function ConfirmButton({
  label,
  question,
  confirmLabel,
  onConfirm,
  disabled,
}: {
  label: string;
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  disabled?: boolean;
}) {
  const { t } = useTranslation();
  const [isAsking, setIsAsking] = useState(false);
  if (!isAsking) {
    return (
      <button type="button" className="btn-primary" disabled={disabled} onClick={() => setIsAsking(true)}>
        {label}
      </button>
    );
  }
  return (
    <span role="group" aria-label={t('common.confirm', { label })} className="flex flex-wrap items-center gap-2 rounded-lg border border-saffron-500/40 bg-saffron-100 px-3 py-2">
      <span className="text-sm text-ink-800">{question}</span>
      <button
        type="button"
        className="btn-primary"
        onClick={() => {
          setIsAsking(false);
          onConfirm();
        }}
      >
        {confirmLabel}
      </button>
      <button type="button" className="btn-quiet" onClick={() => setIsAsking(false)}>
        {t('common.cancel')}
      </button>
    </span>
  );
}
