import { registerWords, type AreaWords } from '@/lib/i18n';

/** The markers page's words (build a marker, watch it shorten, its files); French key for key. */
export const area = 'markerRoom';

const en = {
  title: 'Markers',
  subtitle: 'Graded pieces packed across the fabric width; shorter markers use less fabric.',
  noBatch: 'No batch yet.',
  batch: 'Batch',
  ofBatch: 'Markers of this batch',
  none: 'None yet.',
  status: { queued: 'queued', running: 'running', done: 'done', failed: 'failed', cancelled: 'cancelled' },
  view: {
    title: 'Marker {{ratio}}',
    best: 'Best length <b>{{length}}</b>',
    elapsed: 'Elapsed <b>{{elapsed}} s</b> of {{budget}} s',
    utilisation: 'Utilisation <b>{{percent}}</b>',
    perGarment: '{{length}} per garment',
    facts_one: '{{count}} pieces · width {{width}}',
    facts_other: '{{count}} pieces · width {{width}}',
    progress: 'Marker progress',
    waiting: 'Waiting for the nesting queue…',
    nesting: 'Nesting: the strip is shortened while pieces are moved apart.',
    stop: 'Stop',
    svg: 'Download SVG',
    dxf: 'Plotter file (DXF, 1:1)',
    pdf: 'Plotter PDF (1:1, marker width)',
    drawing: 'Marker drawing',
    drawingOf: 'Marker {{length}} long',
  },
  start: {
    title: 'New marker for {{batch}}',
    ratios: 'Ratios of the cut plan:',
    lay: 'Lay {{seq}}: {{ratio}}',
    garmentsOf: 'Garments of size {{size}}',
    fabric: 'Fabric',
    fabricOption: '{{name}} ({{width}})',
    fabricOptionOneWay: '{{name}} ({{width}}, one way)',
    seconds: 'Seconds',
    serverDefault: 'server default',
    start: 'Start marker',
  },
};

export const words: AreaWords<typeof en> = {
  en,
  fr: {
    title: 'Placements',
    subtitle: 'Les pièces gradées disposées sur la laize du tissu ; un placement plus court consomme moins de tissu.',
    noBatch: 'Aucune série pour l’instant.',
    batch: 'Série',
    ofBatch: 'Placements de cette série',
    none: 'Aucun pour l’instant.',
    status: { queued: 'en attente', running: 'en cours', done: 'terminé', failed: 'échec', cancelled: 'arrêté' },
    view: {
      title: 'Placement {{ratio}}',
      best: 'Meilleure longueur <b>{{length}}</b>',
      elapsed: 'Écoulé <b>{{elapsed}} s</b> sur {{budget}} s',
      utilisation: 'Efficience <b>{{percent}}</b>',
      perGarment: '{{length}} par vêtement',
      facts_one: '{{count}} pièce · laize {{width}}',
      facts_other: '{{count}} pièces · laize {{width}}',
      progress: 'Avancement du placement',
      waiting: 'En attente dans la file de placement…',
      nesting: 'Placement en cours : la longueur se réduit pendant que les pièces sont écartées.',
      stop: 'Arrêter',
      svg: 'Télécharger le SVG',
      dxf: 'Fichier traceur (DXF, 1:1)',
      pdf: 'PDF traceur (1:1, laize du placement)',
      drawing: 'Dessin du placement',
      drawingOf: 'Placement de {{length}} de long',
    },
    start: {
      title: 'Nouveau placement pour {{batch}}',
      ratios: 'Répartitions du plan de coupe :',
      lay: 'Matelas {{seq}} : {{ratio}}',
      garmentsOf: 'Vêtements de taille {{size}}',
      fabric: 'Tissu',
      fabricOption: '{{name}} ({{width}})',
      fabricOptionOneWay: '{{name}} ({{width}}, sens unique)',
      seconds: 'Secondes',
      serverDefault: 'durée par défaut du serveur',
      start: 'Lancer le placement',
    },
  },
};

registerWords(area, words);
