import { useEffect, useRef, useState } from 'react';
import { useStore } from 'zustand';
import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import { ACTIONS, titleOf, type ActionName } from './actionTable.js';
import { registerCommandUi, runCommand } from './appCommands.js';
import { ExportMenu } from './ExportMenu.js';
import { lazyPart } from './lazyPart.js';
import { KeptCopiesButton } from './KeptCopiesButton.js';
import { caseNames } from '../state/caseNames.js';

/** The cautions in full: opened from the top bar, so loaded after the first screen. */
const CautionDialog = lazyPart(() => import('./CautionDialog.js').then((m) => m.CautionDialog));

/** Short words for the file buttons; the table's labels are their tooltips. */
const FILE_WORD: Partial<Record<ActionName, string>> = { new: 'New', open: 'Open…', save: 'Save' };

/** Product name, project name, file actions, units, the case shown, and the caution. */
export function TopBar({ onPrint, onOpen }: { onPrint: () => void; onOpen: (file: File) => Promise<void> }) {
  const store = useAppStore();
  const actions = useActions();
  const name = useApp((s) => s.project.name);
  const units = useApp((s) => s.units);
  const cases = useApp((s) => caseNames(s.project.loadCases));
  const caseView = useApp((s) => s.caseView);
  const canUndo = useStore(store.temporal, (t) => t.pastStates.length > 0);
  const canRedo = useStore(store.temporal, (t) => t.futureStates.length > 0);
  const [cautionOpen, setCautionOpen] = useState(false);
  const fileInput = useRef<HTMLInputElement>(null);

  const open = async (file: File | undefined) => {
    if (file) await onOpen(file);
  };
  useEffect(() => registerCommandUi({ pickFile: () => fileInput.current?.click(), print: onPrint }), [onPrint]);
  const command = (name: ActionName) => runCommand(name, store, actions);
  const caseValue = caseView.kind === 'envelope' ? '__envelope' : caseView.id;

  return (
    <header className="topbar">
      <div className="brand" aria-label="Mainbrace">
        <svg width="22" height="22" viewBox="0 0 64 64" aria-hidden="true">
          <path
            d="M8 44 H30 L46 20 H58"
            fill="none"
            stroke="#1d6fb8"
            strokeWidth="8"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
          <rect x="20" y="48" width="22" height="9" fill="none" stroke="#26251f" strokeWidth="3" />
        </svg>
        Mainbrace
      </div>
      <input
        className="project-name"
        aria-label="Project name"
        title={name}
        value={name}
        maxLength={200}
        onChange={(e) => actions.renameProject(e.target.value)}
      />
      <nav className="file-actions" aria-label="File">
        {ACTIONS.filter((x) => x.menu === 'file').map((x) => (
          <button key={x.name} onClick={() => command(x.name)} title={titleOf(x.name)}>
            {FILE_WORD[x.name] ?? x.label}
          </button>
        ))}
        <input
          ref={fileInput}
          type="file"
          accept=".json,application/json,.geojson,application/geo+json,.csv,text/csv,.txt"
          hidden
          data-testid="open-file"
          onChange={(e) => {
            void open(e.target.files?.[0]);
            e.target.value = '';
          }}
        />
        <ExportMenu run={command} />
        <KeptCopiesButton />
      </nav>
      <div className="history" role="group" aria-label="History">
        <button onClick={actions.undo} disabled={!canUndo} title={titleOf('undo')} aria-label="Undo" data-testid="undo">
          ↶
        </button>
        <button onClick={actions.redo} disabled={!canRedo} title={titleOf('redo')} aria-label="Redo" data-testid="redo">
          ↷
        </button>
      </div>
      <div className="units-switch" role="radiogroup" aria-label="Units">
        {(['si', 'us'] as const).map((u) => (
          <button
            key={u}
            role="radio"
            aria-checked={units === u}
            className={units === u ? 'on' : ''}
            onClick={() => actions.setUnits(u)}
          >
            {u === 'si' ? 'SI' : 'US'}
          </button>
        ))}
      </div>
      <label className="case-select">
        Thrust shown
        <select
          value={caseValue}
          onChange={(e) =>
            actions.setCaseView(
              e.target.value === '__envelope' ? { kind: 'envelope' } : { kind: 'case', id: e.target.value },
            )
          }
        >
          <option value="__envelope">Worst of all cases</option>
          {cases.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label ?? c.id}
            </option>
          ))}
        </select>
      </label>
      <button
        className="caution"
        title="Results must be checked by a licensed engineer against local codes and the utility’s standards"
        onClick={() => setCautionOpen(true)}
        aria-haspopup="dialog"
        data-testid="caution"
      >
        <span aria-hidden="true">⚠</span> Design aid — check by a licensed engineer. <u>Cautions</u>
      </button>
      {cautionOpen && <CautionDialog onClose={() => setCautionOpen(false)} />}
    </header>
  );
}
