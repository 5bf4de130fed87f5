import { describe, expect, it } from 'vitest';
import { AREAS, areaFromHash } from '@/stores/navigation-store';

describe('area ids match their labels', () => {
  it('names each area by its label in kebab-case (or its first word: "bench" for "Bench data")', () => {
    for (const a of AREAS) {
      const kebab = a.label.toLowerCase().replace(/\s+/g, '-');
      expect(kebab === a.id || kebab.startsWith(`${a.id}-`)).toBe(true);
    }
  });

  it('reads the area from the hash, old bookmarks included', () => {
    expect(areaFromHash('#/counter-ions')).toBe('counter-ions');
    expect(areaFromHash('#/model-check')).toBe('model-check');
    expect(areaFromHash('#/library')).toBe('counter-ions');
    expect(areaFromHash('#/confidence')).toBe('model-check');
    expect(areaFromHash('#/nowhere')).toBe('compound');
  });
});
