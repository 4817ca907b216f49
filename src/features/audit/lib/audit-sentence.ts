import type { TFunction } from 'i18next';

/** One row of the trail as the server sends it (before/after are JSON text, possibly cut at 4000 characters). */
export interface AuditEntry {
  id: number;
  userName: string;
  action: string;
  entity: string;
  entityId: number | null;
  /** B-0003, PO-0002, 4: what people call a batch, order or pay period (its number in the studio); null otherwise. */
  record: string | null;
  before: string;
  after: string;
  createdAt: string;
}

const parse = (text: string): Record<string, unknown> | null => {
  if (!text) return null;
  try {
    const v: unknown = JSON.parse(text);
    return v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : null;
  } catch {
    return null;
  }
};

/** A value in a few words: text as is, lists and objects counted or listed briefly. */
function valueText(v: unknown): string {
  if (v === null || v === undefined || v === '') return '—';
  if (Array.isArray(v)) return v.length <= 4 && v.every((x) => typeof x !== 'object') ? v.join(', ') : `[${v.length}]`;
  if (typeof v === 'object') {
    const entries = Object.entries(v as Record<string, unknown>);
    return entries.length <= 5 && entries.every(([, x]) => typeof x !== 'object') ? entries.map(([k, x]) => `${k} ${String(x)}`).join(', ') : `{${entries.length}}`;
  }
  return String(v);
}

/** camelCase to words, for a field the dictionary does not name. */
const words = (key: string) => key.replace(/([a-z])([A-Z])/g, '$1 $2').replace(/_/g, ' ').toLowerCase();

/** "Zawadi changed the studio" in the person's language. */
export function auditSentence(e: AuditEntry, t: TFunction): string {
  const action = t(`audit.actions.${e.action}`, { defaultValue: words(e.action) });
  const entity = t(`audit.entities.${e.entity}`, { defaultValue: words(e.entity) });
  const record = e.record ? `${entity} ${e.record}` : e.entityId && e.entity !== 'studio' ? `${entity} #${e.entityId}` : entity;
  return t('audit.sentence', { who: e.userName, action, record });
}

/** What changed, field by field: `name: A → B` for a change, `name: B` for a new value; nothing when unchanged. */
export function auditChanges(e: AuditEntry, t: TFunction): string[] {
  const before = parse(e.before);
  const after = parse(e.after);
  if (!after) return [];
  const lines: string[] = [];
  for (const [key, value] of Object.entries(after)) {
    const field = t(`audit.fields.${key}`, { defaultValue: words(key) });
    const was = before?.[key];
    if (before && key in before) {
      if (JSON.stringify(was) !== JSON.stringify(value)) lines.push(t('audit.changed', { field, before: valueText(was), after: valueText(value) }));
    } else lines.push(t('audit.set', { field, after: valueText(value) }));
  }
  return lines;
}
