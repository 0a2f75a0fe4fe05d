import { lazy, Suspense } from 'react';
import { Canvas } from './canvas/Canvas.tsx';
import { useEditor } from '../store/editorStore.ts';
import { Tray } from './tray/Tray.tsx';
import { TopBar } from './chrome/TopBar.tsx';
import { NoticeBar } from './chrome/NoticeBar.tsx';
import { FileProblemDialog } from './chrome/FileProblemDialog.tsx';
import { StatusKey } from './chrome/StatusKey.tsx';
import { LabelModeBar } from './chrome/LabelModeBar.tsx';
import { useShortcuts } from './useShortcuts.ts';
import { openFile } from './files/fileActions.ts';
import { DetailsPanel } from './panels/DetailsPanel.tsx';
import { SchedulesDrawer } from './panels/SchedulesDrawer.tsx';
import { FindingsList } from './panels/FindingsList.tsx';
import { ProjectDialog } from './panels/ProjectDialog.tsx';
import { SettingsDialog } from './panels/SettingsDialog.tsx';
import { CautionsDialog } from './panels/CautionsDialog.tsx';
import { PackDialog } from './panels/PackDialog.tsx';
import { HelpOverlay } from './panels/HelpOverlay.tsx';
import { SizingDialog } from './panels/SizingDialog.tsx';

// The site plan and the alternatives load when first opened, so the editor starts without them.
const PlanCanvas = lazy(() => import('./plan/PlanCanvas.tsx').then((m) => ({ default: m.PlanCanvas })));
const AlternativesDialog = lazy(() =>
  import('./panels/AlternativesDialog.tsx').then((m) => ({ default: m.AlternativesDialog })),
);

function onWindowDragOver(e: React.DragEvent) {
  if (e.dataTransfer.types.includes('Files')) {
    e.preventDefault();
    e.dataTransfer.dropEffect = 'copy';
  }
}

function onWindowDrop(e: React.DragEvent) {
  const file = e.dataTransfer.files?.[0];
  if (!file) return;
  e.preventDefault();
  void openFile(file);
}

export function App() {
  useShortcuts();
  const canvasView = useEditor((s) => s.view.canvas);
  const alternativesOpen = useEditor((s) => s.view.dialog === 'alternatives');
  return (
    <main className="ed-app" data-testid="app" onDragOver={onWindowDragOver} onDrop={onWindowDrop}>
      <TopBar />
      <div className="ed-body">
        <Tray />
        <div className="ed-centre">
          {canvasView === 'plan' ? (
            <Suspense fallback={<div className="ed-loading">Opening the site plan…</div>}>
              <PlanCanvas />
            </Suspense>
          ) : (
            <Canvas />
          )}
          <LabelModeBar />
          <StatusKey />
          <NoticeBar />
        </div>
        <DetailsPanel />
      </div>
      <SchedulesDrawer />
      <FindingsList />
      <ProjectDialog />
      <SettingsDialog />
      <CautionsDialog />
      <PackDialog />
      {alternativesOpen && (
        <Suspense fallback={null}>
          <AlternativesDialog />
        </Suspense>
      )}
      <HelpOverlay />
      <SizingDialog />
      <FileProblemDialog />
    </main>
  );
}
