import { describe, expect, it } from 'vitest';
import { importedProjectName } from '@/persistence/imported-name';

describe('the name of an imported project', () => {
  it('keeps the file’s name when no project has it', () => {
    expect(importedProjectName('Batch 7', ['Batch 6', 'Batch 7 (imported)'])).toBe('Batch 7');
  });
  it('adds "(imported)", then a number, when the name is taken', () => {
    expect(importedProjectName('Batch 7', ['Batch 7'])).toBe('Batch 7 (imported)');
    expect(importedProjectName('Batch 7', ['Batch 7', 'Batch 7 (imported)'])).toBe(
      'Batch 7 (imported 2)',
    );
    expect(
      importedProjectName('Batch 7', ['Batch 7', 'Batch 7 (imported)', 'Batch 7 (imported 2)']),
    ).toBe('Batch 7 (imported 3)');
  });
});
