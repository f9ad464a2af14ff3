import { useLayoutEffect, type RefObject } from 'react';
import { ACTIONS, titleOf, type ActionName } from './actionTable.js';

/**
 * The Export menu's open list, from the action table: closes on a choice, on Escape (the keyboard back
 * on the menu's button) and on a click anywhere else.
 */
export function ExportMenuList({
  run,
  close,
  box,
  button,
}: {
  run: (name: ActionName) => void;
  close: () => void;
  box: RefObject<HTMLDivElement | null>;
  button: RefObject<HTMLButtonElement | null>;
}) {
  // Listening from the commit, before the list is painted: a key pressed as soon as the list shows
  // (a passive effect may run a frame later on a busy page) still closes it.
  useLayoutEffect(() => {
    const away = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) close();
    };
    const key = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      e.stopPropagation();
      close();
      button.current?.focus();
    };
    document.addEventListener('pointerdown', away, true);
    window.addEventListener('keydown', key, true);
    return () => {
      document.removeEventListener('pointerdown', away, true);
      window.removeEventListener('keydown', key, true);
    };
  }, [box, button, close]);
  return (
    <div className="menu-list" role="menu">
      {ACTIONS.filter((a) => a.menu === 'export').map((a) => (
        <button
          key={a.name}
          role="menuitem"
          title={titleOf(a.name)}
          onClick={() => {
            close();
            run(a.name);
          }}
        >
          {a.label}
        </button>
      ))}
    </div>
  );
}
