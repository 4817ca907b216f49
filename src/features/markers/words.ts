import { registerWords, type AreaWords } from '@/lib/i18n';

/** The markers screen's own words; French key for key (checked by the type and by src/lib/i18n.test.ts). */
export const area = 'markerRun';

const en = {
  chartTitle: 'Length and density over time',
  chartLabel: 'Best marker length and density over the run',
  length: 'Length',
  density: 'Density',
  seconds: '{{value}} s',
  noPointsYet: 'The first marker is being laid; the chart starts with it.',
  cores_one: 'on {{count}} core',
  cores_other: 'on {{count}} cores',
};

export const words: AreaWords<typeof en> = {
  en,
  fr: {
    chartTitle: 'Longueur et densité au fil du calcul',
    chartLabel: 'Longueur du meilleur placement et densité au fil du calcul',
    length: 'Longueur',
    density: 'Densité',
    seconds: '{{value}} s',
    noPointsYet: 'Le premier placement est en cours ; le graphique commence avec lui.',
    cores_one: 'sur {{count}} cœur',
    cores_other: 'sur {{count}} cœurs',
  },
};

registerWords(area, words);
