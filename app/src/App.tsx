import { useState } from 'react';
import { TopBar } from './chrome/TopBar.js';
import { ToolStrip } from './chrome/ToolStrip.js';
import { NoticeBar } from './chrome/NoticeBar.js';
import { PlanView } from './plan/PlanView.js';
import { DetailsPanel } from './panels/DetailsPanel.js';
import { Drawer } from './panels/Drawer.js';
import { PrintSheet } from './print/PrintSheet.js';
import { KeptCopiesDialog } from './chrome/KeptCopiesDialog.js';
import { useFileOpening } from './files/useFileOpening.js';
import { ImportDialog } from './chrome/ImportDialog.js';

/** One window: top bar, tool strip, plan, details panel, and the drawer of route-wide views. */
export function App() {
  const opening = useFileOpening();
  const [dropping, setDropping] = useState(false);
  const [printing, setPrinting] = useState(false);
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
      <NoticeBar />
      <main className="workspace">
        <ToolStrip />
        <PlanView />
        <DetailsPanel />
      </main>
      <Drawer />
      {printing && <PrintSheet onClose={() => setPrinting(false)} />}
      <KeptCopiesDialog />
      {opening.pending && (
        <ImportDialog pending={opening.pending} onImport={opening.confirm} onCancel={opening.cancel} />
      )}
    </div>
  );
}
