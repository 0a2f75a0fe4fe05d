/**
 * Export → tender pack PDF. jsPDF and the pack's font are fetched when the user first asks, so the
 * editor starts without them (about 160 kB of script and 1.4 MB of font).
 */
import { useEditor } from '../../store/editorStore.ts';
import type { PackFonts } from '../../export/pdf/tenderPack.ts';
import { download } from './fileActions.ts';

let fonts: Promise<PackFonts> | undefined;

async function fontFile(name: string): Promise<string> {
  const response = await fetch(`${import.meta.env.BASE_URL}fonts/${name}`);
  if (!response.ok) throw new Error(`the font ${name} could not be fetched (${response.status})`);
  const bytes = new Uint8Array(await response.arrayBuffer());
  let binary = '';
  for (let k = 0; k < bytes.length; k += 0x8000)
    binary += String.fromCharCode(...bytes.subarray(k, k + 0x8000));
  return btoa(binary);
}

function packFonts(): Promise<PackFonts> {
  fonts ??= Promise.all([fontFile('DejaVuSansCondensed.ttf'), fontFile('DejaVuSansCondensed-Bold.ttf')]).then(
    ([regular, bold]) => ({ regular, bold }),
  );
  // A failed fetch is tried again next time.
  fonts.catch(() => (fonts = undefined));
  return fonts;
}

/** Builds the tender pack of the open project and downloads it (`working: false` leaves the working sheets out). */
export async function exportTenderPack(options: { working?: boolean } = {}): Promise<void> {
  const s = useEditor.getState();
  s.notify('Making the tender pack…', 'info');
  try {
    const [pack, f] = await Promise.all([import('../../export/pdf/tenderPack.ts'), packFonts()]);
    // The project as it is now, solved as the canvas shows it.
    const { doc, results } = useEditor.getState();
    const bytes = pack.tenderPackBytes(doc, results, f, { working: options.working !== false });
    const name = pack.tenderPackFileName(doc);
    download(bytes as Uint8Array<ArrayBuffer>, name, 'application/pdf');
    useEditor
      .getState()
      .notify(
        `Downloaded ${name}: diagram, summary and cautions, schedules, findings${options.working === false ? '' : ' and working'}.`,
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
