import { useEffect, useRef, useState } from 'react';
import { ACTIONS, titleOf, type ActionName } from './actionTable.js';

/** The Export menu, from the action table: closes on a choice, on Escape and on a click anywhere else. */
export function ExportMenu({ run }: { run: (name: ActionName) => void }) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (!open) return;
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    const key = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      e.stopPropagation();
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener('pointerdown', away, true);
    window.addEventListener('keydown', key, true);
    return () => {
      document.removeEventListener('pointerdown', away, true);
      window.removeEventListener('keydown', key, true);
    };
  }, [open]);
  return (
    <div className="menu" ref={box}>
      <button ref={button} aria-haspopup="menu" aria-expanded={open} onClick={() => setOpen(!open)}>
        Export ▾
      </button>
      {open && (
        <div className="menu-list" role="menu">
          {ACTIONS.filter((a) => a.menu === 'export').map((a) => (
            <button
              key={a.name}
              role="menuitem"
              title={titleOf(a.name)}
              onClick={() => {
                setOpen(false);
                run(a.name);
              }}
            >
              {a.label}
            </button>
          ))}
        </div>
      )}
    </div>
  );
}
