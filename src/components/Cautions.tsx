import { useEffect, useRef } from 'react';

/**
 * The cautions every ranking is read with (science brief §6). Shown in full in a dialog reachable
 * from every screen, and as a one-line reminder beside rankings and exports.
 */
export const CAUTION_LINES = [
  'Estimates here screen candidates; they do not establish a salt form.',
  'Crystallinity, polymorphs, hydrates, chemical stability, hygroscopicity and toxicology need experiments.',
  'Counter-ion acceptability follows the regulatory guidance in force for the product.',
  'Strong acids and bases used in salt formation are corrosive: handle them under your lab’s safety rules and the substance’s safety data sheet.',
];

export function CautionNote() {
  return (
    <p className="caution-note" role="note">
      <strong>Screening estimates only.</strong> {CAUTION_LINES[0]} Experiments, the regulatory
      guidance in force and your lab’s safety rules decide.
    </p>
  );
}

export function CautionsDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      if (typeof d.showModal === 'function') d.showModal();
      else d.setAttribute('open', '');
    } else if (!open && d.open) {
      if (typeof d.close === 'function') d.close();
      else d.removeAttribute('open');
    }
  }, [open]);
  return (
    <dialog ref={ref} className="cautions-dialog" aria-labelledby="cautions-title" onClose={onClose}>
      <h2 id="cautions-title">Before you act on a ranking</h2>
      <ul>
        {CAUTION_LINES.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
      <button type="button" onClick={onClose} autoFocus>
        Understood
      </button>
    </dialog>
  );
}
