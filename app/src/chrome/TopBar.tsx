import { savedDocument } from '../state/savedDocument.js';
import { useRef, useState } from 'react';
import { useStore } from 'zustand';
import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import {
  download,
  fileStem,
  openProjectFile,
  projectText,
  quantitiesCsvText,
  scheduleCsvText,
  scheduleJsonText,
} from '../files/projectFile.js';
import { newProject } from '../files/newProject.js';
import { CautionDialog } from './CautionDialog.js';
import { KeptCopiesButton } from './KeptCopiesDialog.js';

/** Product name, project name, file actions, units, the case shown, and the caution. */
export function TopBar({ onPrint }: { onPrint: () => void }) {
  const store = useAppStore();
  const actions = useActions();
  const name = useApp((s) => s.project.name);
  const units = useApp((s) => s.units);
  const cases = useApp((s) => s.project.loadCases);
  const caseView = useApp((s) => s.caseView);
  const canUndo = useStore(store.temporal, (t) => t.pastStates.length > 0);
  const canRedo = useStore(store.temporal, (t) => t.futureStates.length > 0);
  const [cautionOpen, setCautionOpen] = useState(false);
  const [exportOpen, setExportOpen] = useState(false);
  const fileInput = useRef<HTMLInputElement>(null);

  const open = async (file: File | undefined) => {
    if (file) await openProjectFile(file, actions);
  };
  const project = () => store.getState().project;
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
        value={name}
        maxLength={200}
        onChange={(e) => actions.renameProject(e.target.value)}
      />
      <nav className="file-actions" aria-label="File">
        <button
          onClick={() => actions.replaceProject(newProject(project()))}
          title="New project (keeps soils, cases and design settings)"
        >
          New
        </button>
        <button onClick={() => fileInput.current?.click()} title="Open a project file (or drop one on the window)">
          Open…
        </button>
        <input
          ref={fileInput}
          type="file"
          accept=".json,application/json"
          hidden
          data-testid="open-file"
          onChange={(e) => {
            void open(e.target.files?.[0]);
            e.target.value = '';
          }}
        />
        <button
          onClick={() =>
            download(`${fileStem(project())}.json`, projectText(savedDocument(store.getState())), 'application/json')
          }
          title="Save the project file (Ctrl+S)"
        >
          Save
        </button>
        <div className="menu">
          <button aria-haspopup="menu" aria-expanded={exportOpen} onClick={() => setExportOpen(!exportOpen)}>
            Export ▾
          </button>
          {exportOpen && (
            <div className="menu-list" role="menu" onClick={() => setExportOpen(false)}>
              <button
                role="menuitem"
                onClick={() =>
                  download(
                    `${fileStem(project())}-schedule.csv`,
                    scheduleCsvText(project(), store.getState().units),
                    'text/csv',
                  )
                }
              >
                Schedule as CSV
              </button>
              <button
                role="menuitem"
                onClick={() =>
                  download(`${fileStem(project())}-schedule.json`, scheduleJsonText(project()), 'application/json')
                }
              >
                Schedule as JSON
              </button>
              <button
                role="menuitem"
                onClick={() =>
                  download(
                    `${fileStem(project())}-quantities.csv`,
                    quantitiesCsvText(project(), store.getState().units),
                    'text/csv',
                  )
                }
              >
                Quantities as CSV
              </button>
              <button role="menuitem" onClick={onPrint}>
                Print the schedule…
              </button>
            </div>
          )}
        </div>
        <KeptCopiesButton />
      </nav>
      <div className="history" role="group" aria-label="History">
        <button onClick={actions.undo} disabled={!canUndo} title="Undo (Ctrl+Z)" aria-label="Undo" data-testid="undo">
          ↶
        </button>
        <button
          onClick={actions.redo}
          disabled={!canRedo}
          title="Redo (Ctrl+Shift+Z or Ctrl+Y)"
          aria-label="Redo"
          data-testid="redo"
        >
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
