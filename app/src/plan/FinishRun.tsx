import { useActions, useAppStore } from '../state/StoreContext.js';
import { sendPlanEvent } from '../tools/planBridge.js';

/** Touch has no Enter key and no double-click to rely on: while a run is drawn, a button finishes it. */
export function FinishRun() {
  const actions = useActions();
  const store = useAppStore();
  return (
    <div className="plan-finish">
      <button
        onPointerDown={(e) => e.stopPropagation()}
        onClick={() => sendPlanEvent(store, actions, { type: 'command', name: 'finish' })}
        data-testid="finish-run"
      >
        Finish run
      </button>
      <button
        onPointerDown={(e) => e.stopPropagation()}
        onClick={() => sendPlanEvent(store, actions, { type: 'command', name: 'cancel' })}
      >
        Cancel
      </button>
    </div>
  );
}
