import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import type { ToolName } from '../state/store.js';
import { actionSpec, titleOf, type ActionName } from './actionTable.js';
import { sendPlanEvent } from '../tools/planBridge.js';

const TOOLS: { tool: ToolName; action: ActionName; icon: string }[] = [
  {
    tool: 'select',
    action: 'toolSelect',
    icon: 'M5 3 L5 19 L9.5 14.5 L12.5 21 L15 20 L12 13.5 L18 13.5 Z',
  },
  {
    tool: 'draw',
    action: 'toolDraw',
    icon: 'M3 19 L9 19 L15 9 L21 9 M9 19 m-2 0 a2 2 0 1 0 4 0 a2 2 0 1 0 -4 0 M15 9 m-2 0 a2 2 0 1 0 4 0 a2 2 0 1 0 -4 0',
  },
  {
    tool: 'pan',
    action: 'toolPan',
    icon: 'M12 2 L12 22 M2 12 L22 12 M12 2 l-3 3 M12 2 l3 3 M12 22 l-3 -3 M12 22 l3 -3 M2 12 l3 -3 M2 12 l3 3 M22 12 l-3 -3 M22 12 l-3 3',
  },
];

/** The tools along the plan's edge, from the action table; each tooltip names its shortcut. */
export function ToolStrip() {
  const tool = useApp((s) => s.tool);
  const snapping = useApp((s) => s.snapping);
  const actions = useActions();
  const store = useAppStore();
  const give = (name: ActionName) => sendPlanEvent(store, actions, { type: 'command', name });
  return (
    <div className="toolstrip" role="toolbar" aria-label="Tools" aria-orientation="vertical">
      {TOOLS.map((t) => (
        <button
          key={t.tool}
          className={tool === t.tool ? 'on' : ''}
          aria-pressed={tool === t.tool}
          title={titleOf(t.action)}
          aria-label={actionSpec(t.action).label}
          onClick={() => give(t.action)}
          data-testid={`tool-${t.tool}`}
        >
          <svg width="22" height="22" viewBox="0 0 24 24" aria-hidden="true">
            <path
              d={t.icon}
              fill={t.tool === 'select' ? 'currentColor' : 'none'}
              stroke="currentColor"
              strokeWidth="1.8"
              strokeLinecap="round"
              strokeLinejoin="round"
            />
          </svg>
        </button>
      ))}
      <hr />
      <button title={titleOf('fit')} aria-label="Fit to view" onClick={() => give('fit')} data-testid="tool-fit">
        <svg width="22" height="22" viewBox="0 0 24 24" aria-hidden="true">
          <path
            d="M3 8 V3 H8 M16 3 H21 V8 M21 16 V21 H16 M8 21 H3 V16"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.8"
          />
        </svg>
      </button>
      <button
        className={snapping ? 'on' : ''}
        aria-pressed={snapping}
        title={titleOf('toggleSnapping')}
        aria-label="Snapping"
        onClick={() => give('toggleSnapping')}
        data-testid="tool-snap"
      >
        <svg width="22" height="22" viewBox="0 0 24 24" aria-hidden="true">
          <path d="M4 20 L20 20 M4 20 L16 8" fill="none" stroke="currentColor" strokeWidth="1.8" />
          <path d="M10 20 A6 6 0 0 0 8.2 15.8" fill="none" stroke="currentColor" strokeWidth="1.4" />
          <circle cx="16" cy="8" r="2.2" fill="currentColor" />
        </svg>
      </button>
    </div>
  );
}
