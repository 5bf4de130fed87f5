import { describe, expect, it } from 'vitest';
import { DEMO_COMPOUND } from '@/persistence/demo-project';
import { projectSettingsSchema, type ProjectRecord } from '@/persistence/records';
import { screeningInputsKey } from '@/screening-data/compute-screening';
import { screeningSettingsOf } from '@/screening-data/screening-settings';

const project = (extra: Record<string, unknown> = {}, chlorideM = 0.12): ProjectRecord => ({
  id: 'p',
  schemaVersion: 1,
  name: 'key test',
  createdAt: '',
  updatedAt: '',
  archived: false,
  isDemo: false,
  compound: DEMO_COMPOUND,
  settings: projectSettingsSchema.parse({ gastricChlorideM: chlorideM, extra }),
});
const key = (p: ProjectRecord) =>
  screeningInputsKey({ project: p, candidates: [], measurements: [], customIons: [] });

describe('the screen re-runs only when the physics changes', () => {
  it('moving a weight leaves the key unchanged (the ranking re-weights the stored rows)', () => {
    expect(key(project({ screening: { weights: { massCost: 3 } } }))).toBe(key(project()));
  });
  it('changing the gastric chloride or a ΔpKa band changes the key', () => {
    expect(key(project({}, 0.2))).not.toBe(key(project()));
    expect(
      key(
        project({
          screening: { deltaPkaBands: { cocrystalBelow: -1, saltAbove: 3, stableSaltMin: 2 } },
        }),
      ),
    ).not.toBe(key(project()));
  });
  it('reads a stored block field by field: an invalid field falls back to its default, valid ones are kept', () => {
    const s = screeningSettingsOf(
      project({ screening: { gastricPh: 99, weights: { massCost: 2 } } }),
    );
    expect(s.gastricPh).toBe(1.2);
    expect(s.weights.massCost).toBe(2);
    // The project's own fields win: temperature in °C becomes kelvin (T/K = t/°C + 273.15).
    expect(s.temperatureK).toBeCloseTo(37 + 273.15, 10);
  });
});
