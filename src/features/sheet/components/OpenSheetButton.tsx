import { useSheetStore } from '../sheet-store';

/** Opens the printable comparison sheet of the open project. */
export function OpenSheetButton({ className }: { className?: string }) {
  const show = useSheetStore((s) => s.show);
  return (
    <button type="button" className={className} onClick={show}>
      Comparison sheet
    </button>
  );
}
