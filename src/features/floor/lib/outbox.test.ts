import { describe, expect, it } from 'vitest';
import { refusalText } from './outbox';

describe('a refused waiting log, said once', () => {
  it('gives the server\'s refusal alone when it already names the bundle, and puts the label in front otherwise', () => {
    expect(refusalText('Bundle 12 · OP04', 'Bundle 12 · OP04 Join shoulders was already logged by Neema Chebet at 09:12 UTC')).toBe(
      'Bundle 12 · OP04 Join shoulders was already logged by Neema Chebet at 09:12 UTC',
    );
    expect(refusalText('Paquet 12 · OP04', 'Le paquet 12 · OP04 Monter les épaules est déjà enregistré')).toBe('Le paquet 12 · OP04 Monter les épaules est déjà enregistré');
    expect(refusalText('Bundle 12 · OP04', 'Batch B-0002 is shipped; nothing more is logged on it')).toBe('Bundle 12 · OP04: Batch B-0002 is shipped; nothing more is logged on it');
  });
});
