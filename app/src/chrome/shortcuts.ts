import { savedDocument } from '../state/savedDocument.js';
import type { AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import { drawStep } from '../tools/drawTool.js';
import { fitView } from '../state/viewport.js';
import { download, fileStem, projectText } from '../files/projectFile.js';

/** A field the user types into (a slider, box or button is not one: its undo is the app's). */
const typing = (t: EventTarget | null) =>
  (t instanceof HTMLInputElement && !['range', 'checkbox', 'radio', 'button', 'file'].includes(t.type)) ||
  t instanceof HTMLTextAreaElement ||
  t instanceof HTMLSelectElement;

/** Keyboard shortcuts of the whole window; keys typed into a field are left to the field. */
export function installShortcuts(store: AppStore, actions: Actions): () => void {
  const onKey = (e: KeyboardEvent) => {
    const mod = e.ctrlKey || e.metaKey;
    if (mod && e.key.toLowerCase() === 'z' && !typing(e.target)) {
      e.preventDefault();
      if (e.shiftKey) actions.redo();
      else actions.undo();
      return;
    }
    if (mod && e.key.toLowerCase() === 'y' && !typing(e.target)) {
      e.preventDefault();
      actions.redo();
      return;
    }
    if (mod && e.key.toLowerCase() === 's') {
      e.preventDefault();
      const p = savedDocument(store.getState());
      download(`${fileStem(p)}.json`, projectText(p), 'application/json');
      return;
    }
    if (mod || e.altKey || typing(e.target)) return;
    const s = store.getState();
    const drawing = s.tool === 'draw' && s.draw.phase === 'drawing';
    const finishDraw = (type: 'finish' | 'cancel' | 'removeVertex') => {
      const out = drawStep(s.draw, { type }, { snapping: s.snapping, lengthStep: 1, samePoint: 0 });
      actions.setDraw(out.state);
      if (out.commit) actions.addRun(out.commit.start, out.commit.vertices, out.commit.end);
    };
    switch (e.key) {
      case 'Enter':
        if (drawing) finishDraw('finish');
        break;
      case 'Escape':
        if (drawing) finishDraw('cancel');
        else actions.clearSelection();
        break;
      case 'Backspace':
        if (drawing) {
          e.preventDefault();
          finishDraw('removeVertex');
        } else actions.deleteSelection();
        break;
      case 'Delete':
        actions.deleteSelection();
        break;
      case 'v':
      case 'V':
        actions.setTool('select');
        break;
      case 'd':
      case 'D':
        actions.setTool('draw');
        break;
      case 'h':
      case 'H':
        actions.setTool('pan');
        break;
      case 's':
      case 'S':
        actions.toggleSnapping();
        break;
      case 'f':
      case 'F': {
        const el = document.querySelector('[data-testid="plan"]');
        actions.setViewport(fitView(s.project.nodes, el?.clientWidth ?? 800, el?.clientHeight ?? 500));
        break;
      }
    }
  };
  window.addEventListener('keydown', onKey);
  return () => window.removeEventListener('keydown', onKey);
}
