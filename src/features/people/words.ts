import { registerWords, type AreaWords } from '@/lib/i18n';

/** The People page's words; French key for key (checked by the type and by src/lib/i18n.test.ts). */
export const area = 'people';

const en = {
  you: 'you',
  roleOf: 'Role of {{name}}',
};

export const words: AreaWords<typeof en> = {
  en,
  fr: {
    you: 'vous',
    roleOf: 'Rôle de {{name}}',
  },
};

registerWords(area, words);
