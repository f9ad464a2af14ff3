import { useState } from 'react';
import { useStore } from 'zustand';
import { TopBar } from './chrome/TopBar.js';
import { ToolStrip } from './chrome/ToolStrip.js';
import { PlanView } from './plan/PlanView.js';
import { DetailsPanel } from './panels/DetailsPanel.js';
import { Drawer } from './panels/Drawer.js';
import { useFileOpening } from './files/useFileOpening.js';
import { keptCopiesView } from './state/keptCopiesView.js';
import { lazyPart } from './chrome/lazyPart.js';

// Off the first screen, each in a chunk of its own (docs/performance.md).
const PrintSheet = lazyPart(() => import('./print/PrintSheet.js').then((m) => m.PrintSheet));
const KeptCopiesDialog = lazyPart(() => import('./chrome/KeptCopiesDialog.js').then((m) => m.KeptCopiesDialog));
const ImportDialog = lazyPart(() => import('./chrome/ImportDialog.js').then((m) => m.ImportDialog));

/** One window: top bar, tool strip, plan, details panel, and the drawer of route-wide views. */
export function App() {
  const opening = useFileOpening();
  const [dropping, setDropping] = useState(false);
  const [printing, setPrinting] = useState(false);
  const keptCopiesOpen = useStore(keptCopiesView, (s) => s.open);
  const onDrop = async (e: React.DragEvent) => {
    e.preventDefault();
    setDropping(false);
    const file = e.dataTransfer.files[0];
    if (file) await opening.open(file);
  };
  return (
    <div
      className={`app ${dropping ? 'app-dropping' : ''}`}
      onDragOver={(e) => {
        if (e.dataTransfer.types.includes('Files')) {
          e.preventDefault();
          setDropping(true);
        }
      }}
      onDragLeave={() => setDropping(false)}
      onDrop={onDrop}
    >
      <TopBar onPrint={() => setPrinting(true)} onOpen={opening.open} />
      <main className="workspace">
        <ToolStrip />
        <PlanView />
        <DetailsPanel />
      </main>
      <Drawer />
      {printing && <PrintSheet onClose={() => setPrinting(false)} />}
      {keptCopiesOpen && <KeptCopiesDialog />}
      {opening.pending && (
        <ImportDialog pending={opening.pending} onImport={opening.confirm} onCancel={opening.cancel} />
      )}
    </div>
  );
}
