import { useCallback, useRef, useState } from 'react';
import type { ActionName } from './actionTable.js';
import { lazyPart } from './lazyPart.js';

// The open list loads in the warm-up after the first draw, not in the first screen (docs/performance.md).
const List = lazyPart(() => import('./ExportMenuList.js').then((m) => m.ExportMenuList));

/** The Export menu's button, and its list while open (chrome/ExportMenuList.tsx). */
export function ExportMenu({ run }: { run: (name: ActionName) => void }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const close = useCallback(() => setOpen(false), []);
  return (
    <div className="menu" ref={box}>
      <button ref={button} aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen(!open)}>
        Export ▾
      </button>
      {open && <List run={run} close={close} box={box} button={button} />}
    </div>
  );
}
