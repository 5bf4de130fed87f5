import { beforeEach, describe, expect, it } from 'vitest';
import { resetDbForTests } from '../support/db';
import { measurementsRepo } from '@/persistence/measurements-repo';

beforeEach(async () => {
  await resetDbForTests();
});

const base = {
  projectId: 'p1',
  candidateId: 'c1',
  kind: 'solubility' as const,
  value: 1.5,
  unit: 'mg/mL',
  ph: 1.2,
  temperatureK: 310.15,
  medium: 'water',
  text: '',
};

describe('measurementsRepo', () => {
  it('updates a record only with a valid patch', async () => {
    const m = await measurementsRepo.add(base);
    await measurementsRepo.update(m.id, { value: 2 });
    expect((await measurementsRepo.listForCandidate('c1'))[0]?.value).toBe(2);
    await expect(measurementsRepo.update(m.id, { ph: 15 })).rejects.toThrow();
    expect((await measurementsRepo.listForCandidate('c1'))[0]?.ph).toBe(1.2);
  });

  it('refuses an invalid record and stores nothing', async () => {
    await expect(measurementsRepo.add({ ...base, temperatureK: -3 })).rejects.toThrow();
    expect(await measurementsRepo.listForProject('p1')).toHaveLength(0);
  });

  it('counts measurements per project', async () => {
    await measurementsRepo.add(base);
    await measurementsRepo.add(base);
    await measurementsRepo.add({ ...base, projectId: 'p2' });
    const counts = await measurementsRepo.countByProject();
    expect(counts.get('p1')).toBe(2);
    expect(counts.get('p2')).toBe(1);
  });
});
