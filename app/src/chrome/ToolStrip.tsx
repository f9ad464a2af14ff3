import { fitView } from '../state/viewport.js';
import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import type { ToolName } from '../state/store.js';

const TOOLS: { tool: ToolName; label: string; key: string; icon: string }[] = [
  {
    tool: 'select',
    label: 'Select and move — drag empty ground to pan, Shift-drag to box-select',
    key: 'V',
    icon: 'M5 3 L5 19 L9.5 14.5 L12.5 21 L15 20 L12 13.5 L18 13.5 Z',
  },
  {
    tool: 'draw',
    label: 'Draw main',
    key: 'D',
    icon: 'M3 19 L9 19 L15 9 L21 9 M9 19 m-2 0 a2 2 0 1 0 4 0 a2 2 0 1 0 -4 0 M15 9 m-2 0 a2 2 0 1 0 4 0 a2 2 0 1 0 -4 0',
  },
  {
    tool: 'pan',
    label: 'Pan',
    key: 'H',
    icon: 'M12 2 L12 22 M2 12 L22 12 M12 2 l-3 3 M12 2 l3 3 M12 22 l-3 -3 M12 22 l3 -3 M2 12 l3 -3 M2 12 l3 3 M22 12 l-3 -3 M22 12 l-3 3',
  },
];

/** The tools along the plan's edge; each tooltip names its shortcut. */
export function ToolStrip() {
  const tool = useApp((s) => s.tool);
  const snapping = useApp((s) => s.snapping);
  const actions = useActions();
  const store = useAppStore();
  const fit = () => {
    const el = document.querySelector('[data-testid="plan"]');
    const s = store.getState();
    actions.setViewport(fitView(s.project.nodes, el?.clientWidth ?? 800, el?.clientHeight ?? 500));
  };
  return (
    <div className="toolstrip" role="toolbar" aria-label="Tools" aria-orientation="vertical">
      {TOOLS.map((t) => (
        <button
          key={t.tool}
          className={tool === t.tool ? 'on' : ''}
          aria-pressed={tool === t.tool}
          title={`${t.label} (${t.key})`}
          aria-label={t.label}
          onClick={() => actions.setTool(t.tool)}
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
      <button title="Fit the route to the view (F)" aria-label="Fit to view" onClick={fit} data-testid="tool-fit">
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
        title="Snap to standard bends and whole lengths (S)"
        aria-label="Snapping"
        onClick={actions.toggleSnapping}
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
