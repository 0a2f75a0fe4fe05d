/**
 * Export → tender pack PDF. The pack is made in a worker (packWorker.ts), so the page stays
 * responsive; jsPDF and the pack's font are loaded there when the user first asks, so the editor
 * starts without them. Where a browser offers no module worker, it is made on the page instead.
 * The single-line diagram alone, as SVG, is quick and made on the page.
 */
import { useEditor } from '../../store/editorStore.ts';
import { drawingFileName, tenderPackFileName } from '../../export/fileNames.ts';
import { download } from './fileActions.ts';
import { fetchPackFonts } from './packFonts.ts';
import type { PackReply, PackRequest } from './packWorker.ts';
import type { PlanPicture } from '../../export/pdf/packPlan.ts';
import type { SitePlan } from '../../model/types.ts';
import { drawPicture } from '../plan/planPicture.ts';

/** Longest side of the plan picture in the pack, pixels: sharp on A3 without a heavy file. */
const PLAN_RASTER_PX = 2400;

/**
 * An SVG site plan drawn to a PNG on the page (the worker and jsPDF cannot draw SVG); null when
 * the picture is already PNG or JPEG, or cannot be drawn (the pack then says so on the sheet).
 */
async function planRaster(plan: SitePlan | undefined): Promise<PlanPicture | null> {
  if (!plan || !plan.image.startsWith('data:image/svg+xml')) return null;
  try {
    const { canvas } = await drawPicture(plan.image, PLAN_RASTER_PX, true);
    return { dataUrl: canvas.toDataURL('image/png'), widthPx: canvas.width, heightPx: canvas.height };
  } catch {
    return null;
  }
}

function inWorker(request: PackRequest): Promise<Uint8Array<ArrayBuffer>> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./packWorker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<PackReply>) => {
      worker.terminate();
      if (e.data.ok) resolve(e.data.bytes);
      else reject(new Error(e.data.error));
    };
    worker.onerror = (e) => {
      worker.terminate();
      reject(new Error(e.message || 'the worker making the pack stopped'));
    };
    worker.postMessage(request);
  });
}

async function onPage(request: PackRequest): Promise<Uint8Array<ArrayBuffer>> {
  const [pack, fonts] = await Promise.all([
    import('../../export/pdf/tenderPack.ts'),
    fetchPackFonts(request.base),
  ]);
  const { results } = useEditor.getState();
  return pack.tenderPackBytes(request.doc, results, fonts, {
    working: request.working,
    ...(request.planPicture ? { planPicture: request.planPicture } : {}),
  }) as Uint8Array<ArrayBuffer>;
}

/** Builds the tender pack of the open project and downloads it (`working: false` leaves the working sheets out). */
export async function exportTenderPack(options: { working?: boolean } = {}): Promise<void> {
  const s = useEditor.getState();
  s.notify('Making the tender pack…', 'info');
  // The project as it is at the click; later edits do not change this pack.
  const request: PackRequest = {
    doc: s.doc,
    working: options.working !== false,
    base: import.meta.env.BASE_URL,
  };
  try {
    const picture = await planRaster(request.doc.plan);
    if (picture) request.planPicture = picture;
    const bytes = typeof Worker === 'function' ? await inWorker(request) : await onPage(request);
    const name = tenderPackFileName(request.doc);
    download(bytes, name, 'application/pdf');
    useEditor
      .getState()
      .notify(
        `Downloaded ${name}: diagram, summary and cautions, schedules, findings${request.working ? ' and working' : ''}.`,
      );
  } catch (e) {
    useEditor
      .getState()
      .notify(
        `The tender pack could not be made: ${e instanceof Error ? e.message : String(e)}. Nothing was changed.`,
        'error',
      );
  }
}

/**
 * Builds the single-line diagram of the open project as SVG on the page (a fraction of a second)
 * and downloads it; the SVG module and jsPDF, which measures its labels, are loaded on first use.
 */
export async function exportDrawingSvg(): Promise<void> {
  const s = useEditor.getState();
  // The project as it is at the click.
  const { doc, results } = s;
  try {
    const [svg, fonts] = await Promise.all([
      import('../../export/svg/diagramSvg.ts'),
      fetchPackFonts(import.meta.env.BASE_URL),
    ]);
    const name = drawingFileName(doc);
    download(svg.diagramSvg(doc, results, fonts), name, 'image/svg+xml');
    useEditor.getState().notify(`Downloaded ${name}: the single-line diagram as SVG.`);
  } catch (e) {
    useEditor
      .getState()
      .notify(
        `The drawing could not be made: ${e instanceof Error ? e.message : String(e)}. Nothing was changed.`,
        'error',
      );
  }
}
