import type { AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import { sendPlanEvent } from '../tools/planBridge.js';
import { runCommand } from './appCommands.js';
import { actionForKey } from './actionTable.js';

/** A field the user types into (a slider, box or button is not one: its undo is the app's). */
const typing = (t: EventTarget | null) =>
  (t instanceof HTMLInputElement && !['range', 'checkbox', 'radio', 'button', 'file'].includes(t.type)) ||
  t instanceof HTMLTextAreaElement ||
  t instanceof HTMLSelectElement;

/** Keys that act on a focused button or link (press it) and must be left to it. */
const pressesControl = (e: KeyboardEvent) =>
  (e.key === 'Enter' || e.key === ' ') &&
  (e.target instanceof HTMLButtonElement ||
    e.target instanceof HTMLAnchorElement ||
    (e.target as HTMLElement)?.getAttribute?.('role') === 'row');

/** Moves the keyboard to the details panel (Enter on a selected fitting). */
export function focusDetails() {
  const first = document.querySelector<HTMLElement>(
    '[data-testid="details"] input, [data-testid="details"] select, [data-testid="details"] button',
  );
  (first ?? document.querySelector<HTMLElement>('[data-testid="details"]'))?.focus();
}

/**
 * The window's keys, from the action table, through the plan's dispatcher. Keys typed into a field are
 * left to the field, except Save.
 */
export function installShortcuts(store: AppStore, actions: Actions): () => void {
  const handlers = {
    command: (name: Parameters<typeof runCommand>[0]) => runCommand(name, store, actions),
    openDetails: focusDetails,
  };
  const onKey = (e: KeyboardEvent) => {
    const action = actionForKey({ key: e.key, shift: e.shiftKey, ctrl: e.ctrlKey, meta: e.metaKey, alt: e.altKey });
    if (typing(e.target) && action?.name !== 'save') return;
    // A typed entry under way takes every key, even with the tool's button still focused (its space and Enter).
    const entering = store.getState().typed !== '';
    if (pressesControl(e) && !entering) return;
    const plan = document.querySelector('[data-testid="plan"]');
    const out = sendPlanEvent(
      store,
      actions,
      {
        type: 'key',
        key: e.key,
        shift: e.shiftKey,
        ctrl: e.ctrlKey,
        meta: e.metaKey,
        alt: e.altKey,
        planFocused: plan !== null && document.activeElement === plan,
      },
      handlers,
    );
    if (out.handled && e.key !== ' ') e.preventDefault();
    if (out.handled && e.key === ' ' && (entering || document.activeElement === plan)) e.preventDefault();
  };
  const onKeyUp = (e: KeyboardEvent) => {
    if (e.key === ' ') sendPlanEvent(store, actions, { type: 'keyUp', key: ' ' });
  };
  window.addEventListener('keydown', onKey);
  window.addEventListener('keyup', onKeyUp);
  return () => {
    window.removeEventListener('keydown', onKey);
    window.removeEventListener('keyup', onKeyUp);
  };
}
