import { useCallback, useEffect, useRef, useState } from 'react';
import { ChemInputError, parseStructure, type ParsedStructure } from '@/chem';

/** Delay before the stored structure is parsed, ms: lets the first screen paint and settle first. */
const DEFER_FIRST_PARSE_MS = 400;

export interface GoodStructure {
  smiles: string;
  parsed: ParsedStructure;
}

export type StructureStatus = 'idle' | 'loading' | 'ready' | 'error';

/**
 * Parses SMILES with openchemlib (loaded on first use) and keeps the last structure that parsed: a bad
 * SMILES never replaces the picture and data of the good one. `check` resolves to the parsed structure
 * or to a field message; stale answers (the user typed on) are dropped.
 */
export function useStructureCheck(initialSmiles: string) {
  const [good, setGood] = useState<GoodStructure | null>(null);
  const [status, setStatus] = useState<StructureStatus>(initialSmiles.trim() ? 'loading' : 'idle');
  const seq = useRef(0);

  const check = useCallback(async (smiles: string): Promise<{ ok: true; structure: GoodStructure | null } | { ok: false; message: string } | { ok: 'stale' }> => {
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
      setStatus((s) => (s === 'loading' ? 'error' : s));
      const message =
        err instanceof ChemInputError ? err.message.replace(/^smiles: /, '').replace(/ \(accepted: .*\)$/, '') : 'Cannot read this SMILES';
      return { ok: false, message: message.charAt(0).toUpperCase() + message.slice(1) };
    }
  }, []);

  // The stored structure, drawn on open (and when another project opens). The ~1 MB chemistry library
  // is fetched only after the first screen has settled, and not at all if the area closes before.
  useEffect(() => {
    const t = setTimeout(() => void check(initialSmiles), DEFER_FIRST_PARSE_MS);
    return () => {
      clearTimeout(t);
    };
  }, [initialSmiles, check]);

  return { good, status, check };
}
