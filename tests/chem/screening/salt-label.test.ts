import { describe, expect, it } from 'vitest';
import { getCounterIon, saltLabel } from '@/chem';

// The salt names are the trade's usual ones (hydrochloride, hemisulfate — common practice, as listed in
// the counter-ion library); these checks pin which name wins, not the library's contents.
describe('saltLabel: one name for a salt in the app and the CLI', () => {
  const sulfate = getCounterIon('sulfate')!;

  it('keeps a stoichiometry label that names the salt', () => {
    expect(
      saltLabel('Chloride', { label: 'hydrochloride (1:1)', drugPerSalt: 1, counterIonPerSalt: 1 }),
    ).toBe('hydrochloride (1:1)');
  });

  it('a label with only a ratio takes the library name listed for that ratio and charge', () => {
    const listed = sulfate.stoichiometries.find((s) => s.drugPerSalt === 2)!;
    expect(
      saltLabel(
        sulfate.name,
        { label: '(2:1)', drugPerSalt: 2, counterIonPerSalt: 1, ionCharge: listed.ionCharge },
        sulfate.stoichiometries,
      ),
    ).toBe(listed.label);
  });

  it('a listed ratio with another charge is not borrowed; an unlisted ratio is the ion name and ratio', () => {
    const listed = sulfate.stoichiometries.find((s) => s.drugPerSalt === 2)!;
    const other = { drugPerSalt: 2, counterIonPerSalt: 1, ionCharge: listed.ionCharge + 1 };
    expect(saltLabel('Sulfate', other, sulfate.stoichiometries)).toBe('sulfate (2:1)');
    expect(saltLabel('Sulfate', { drugPerSalt: 1, counterIonPerSalt: 3 }, [])).toBe(
      'sulfate (1:3)',
    );
  });
});
