import { useEffect, useRef } from 'react';
import { CAUTIONS } from '@mainbrace/solver';

/** The full cautions, opened from the caution in the top bar. */
export function CautionDialog({ onClose }: { onClose: () => void }) {
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => close.current?.focus(), []);
  return (
    <div className="dialog-backdrop" onClick={onClose}>
      <div
        className="dialog"
        role="dialog"
        aria-modal="true"
        aria-labelledby="caution-title"
        onClick={(e) => e.stopPropagation()}
        onKeyDown={(e) => e.key === 'Escape' && onClose()}
      >
        <h2 id="caution-title">Before you build from these results</h2>
        <ul>
          {CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
        <button ref={close} onClick={onClose}>
          Understood
        </button>
      </div>
    </div>
  );
}
