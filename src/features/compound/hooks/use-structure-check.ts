import { useCallback, useEffect, useRef, useState } from 'react';
import {
  ChemInputError,
  StructureLibraryUnavailableError,
  parseStructure,
  type ParsedStructure,
} from '@/chem';

/** Longest wait for an idle moment before the stored structure is parsed, ms. */
const IDLE_TIMEOUT_MS = 2000;
/** Where the browser has no idle callback: delay before the stored structure is parsed, ms. */
const FALLBACK_DELAY_MS = 1500;

export interface GoodStructure {
  smiles: string;
  parsed: ParsedStructure;
}

export type StructureStatus = 'idle' | 'loading' | 'ready' | 'error' | 'unavailable';

/**
 * Parses SMILES with openchemlib (loaded on first use) and keeps the last structure that parsed: a bad
 * SMILES never replaces the picture and data of the good one. `check` resolves to the parsed structure
 * or to a field message; stale answers (the user typed on) are dropped.
 */
export function useStructureCheck(initialSmiles: string) {
  const [good, setGood] = useState<GoodStructure | null>(null);
  const [status, setStatus] = useState<StructureStatus>(initialSmiles.trim() ? 'loading' : 'idle');
  const seq = useRef(0);

  const check = useCallback(
    async (
      smiles: string,
    ): Promise<
      | { ok: true; structure: GoodStructure | null }
      | { ok: false; message: string }
      | { ok: 'stale' }
    > => {
      const text = smiles.trim();
      const mine = ++seq.current;
      if (text === '') {
        setGood(null);
        setStatus('idle');
        return { ok: true, structure: null };
      }
      setStatus((s) => (s === 'ready' ? s : 'loading'));
      try {
        const parsed = await parseStructure(text);
        if (mine !== seq.current) return { ok: 'stale' };
        const structure = { smiles: text, parsed };
        setGood(structure);
        setStatus('ready');
        return { ok: true, structure };
      } catch (err) {
        if (mine !== seq.current) return { ok: 'stale' };
        if (err instanceof StructureLibraryUnavailableError) {
          setStatus((s) => (s === 'ready' ? s : 'unavailable'));
          return {
            ok: false,
            message:
              'Cannot check the SMILES now: the chemistry library could not be loaded (reload the page to retry)',
          };
        }
        setStatus((s) => (s === 'loading' ? 'error' : s));
        const message =
          err instanceof ChemInputError
            ? err.message.replace(/^smiles: /, '').replace(/ \(accepted: .*\)$/, '')
            : 'Cannot read this SMILES';
        return { ok: false, message: message.charAt(0).toUpperCase() + message.slice(1) };
      }
    },
    [],
  );

  // The stored structure, drawn on open (and when another project opens). The ~1 MB chemistry library
  // is fetched when the browser is idle after the first screen, and not at all if the area closes before.
  useEffect(() => {
    const run = () => void check(initialSmiles);
    const w = globalThis as {
      requestIdleCallback?: (cb: () => void, opts?: { timeout: number }) => number;
      cancelIdleCallback?: (handle: number) => void;
    };
    if (typeof w.requestIdleCallback === 'function') {
      const handle = w.requestIdleCallback(run, { timeout: IDLE_TIMEOUT_MS });
      return () => w.cancelIdleCallback?.(handle);
    }
    const t = setTimeout(run, FALLBACK_DELAY_MS);
    return () => clearTimeout(t);
  }, [initialSmiles, check]);

  return { good, status, check };
}
