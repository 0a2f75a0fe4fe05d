/**
 * Makes the tender pack off the page's thread, so the editor stays responsive while a large
 * project's pack (hundreds of sheets of working) is written. The document comes in as data and is
 * solved here with the same engine the editor uses; the PDF's bytes go back, transferred.
 */
import type { ProjectDocument } from '../../model/types.ts';
import { solve } from '../../solver/solve.ts';
import { tenderPackBytes } from '../../export/pdf/tenderPack.ts';
import type { PlanPicture } from '../../export/pdf/packPlan.ts';
import { fetchPackFonts } from './packFonts.ts';

export interface PackRequest {
  doc: ProjectDocument;
  working: boolean;
  /** The app's base URL, for the font files. */
  base: string;
  /** The site plan picture drawn to a PNG on the page, when the project's is an SVG. */
  planPicture?: PlanPicture;
}

export type PackReply = { ok: true; bytes: Uint8Array<ArrayBuffer> } | { ok: false; error: string };

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<PackRequest>) => void) | null;
  postMessage(message: PackReply, transfer?: Transferable[]): void;
};

scope.onmessage = (e) => {
  const { doc, working, base, planPicture } = e.data;
  fetchPackFonts(base)
    .then((fonts) => {
      const bytes = tenderPackBytes(doc, solve(doc), fonts, {
        working,
        ...(planPicture ? { planPicture } : {}),
      }) as Uint8Array<ArrayBuffer>;
      scope.postMessage({ ok: true, bytes }, [bytes.buffer]);
    })
    .catch((error: unknown) => {
      scope.postMessage({ ok: false, error: error instanceof Error ? error.message : String(error) });
    });
};
