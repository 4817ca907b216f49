import { registerWords, type AreaWords } from '@/lib/i18n';

/** The words of opening a new studio (the sign-in screen's are in the main dictionary); French key for key. */
export const area = 'newStudio';

const en = {
  title: 'Open a new studio',
  intro: "You become the studio's owner and can add your cutter and floor staff.",
  studioName: 'Studio name',
  currency: 'Currency (ISO 4217)',
  units: 'Units',
  metric: 'Metric (cm, m)',
  imperial: 'Imperial (in, yd)',
  language: 'Language of the studio',
  yourName: 'Your name',
  email: 'Email',
  password: 'Password',
  passwordHint: 'At least 10 characters',
  create: 'Create studio',
  back: 'Back to sign in',
};

export const words: AreaWords<typeof en> = {
  en,
  fr: {
    title: 'Ouvrir un nouvel atelier',
    intro: 'Vous devenez la gérante ou le gérant de l’atelier et pouvez ajouter votre coupeur et le personnel de l’atelier.',
    studioName: 'Nom de l’atelier',
    currency: 'Monnaie (ISO 4217)',
    units: 'Unités',
    metric: 'Métriques (cm, m)',
    imperial: 'Impériales (po, vg)',
    language: 'Langue de l’atelier',
    yourName: 'Votre nom',
    email: 'Courriel',
    password: 'Mot de passe',
    passwordHint: 'Au moins 10 caractères',
    create: 'Créer l’atelier',
    back: 'Retour à la connexion',
  },
};

registerWords(area, words);
