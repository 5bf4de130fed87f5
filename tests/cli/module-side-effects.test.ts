import { describe, expect, it, vi } from 'vitest';

describe('CLI modules have no import-time side effects', () => {
  it('importing every command leaves the eval registry empty until registerBuiltInEvalKinds() is called', async () => {
    vi.resetModules();
    const { evalRegistry } = await import('@/cli/commands/eval/registry');
    await import('@/cli/commands/eval/eval-command');
    await import('@/cli/commands/screen/screen-command');
    await import('@/cli/commands/lattice');
    await import('@/cli/commands/ions');
    await import('@/cli/serve/serve-command');
    expect(evalRegistry.list()).toEqual([]);
    const { registerBuiltInEvalKinds } = await import('@/cli/commands/eval/built-in-kinds');
    registerBuiltInEvalKinds();
    registerBuiltInEvalKinds(); // a second call changes nothing
    expect(evalRegistry.list()).toEqual(['salt', 'ph-solubility']);
  });

  it('main() registers the built-in kinds itself', async () => {
    vi.resetModules();
    const { main } = await import('@/cli/main');
    const { captureIo } = await import('./support/capture-io');
    const c = captureIo(
      '{"kind":"ph-solubility","drug":{"kind":"base","pKas":[8],"log10IntrinsicM":-5}}\n',
    );
    expect(await main(['eval'], c.io)).toBe(0);
    expect(JSON.parse(c.out()).kind).toBe('ph-solubility');
  });
});
