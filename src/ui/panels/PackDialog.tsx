import { useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { CAUTIONS } from '../../model/cautions.ts';
import { exportDrawingSvg, exportTenderPack } from '../files/exportPack.ts';
import { Dialog } from './Dialog.tsx';

/**
 * What goes into the tender pack, and the download. The working is the long part (about one A3
 * sheet for every two elements), so it can be left out of a quick issue.
 */
export function PackDialog() {
  const open = useEditor((s) => s.view.dialog === 'pack');
  const close = useEditor((s) => s.closeDialog);
  const elements = useEditor((s) => s.doc.nodes.length + s.doc.cables.length);
  const alternatives = useEditor((s) => s.doc.alternatives.length);
  const onPlan = useEditor((s) => s.doc.nodes.some((n) => n.plan !== undefined));
  const [working, setWorking] = useState(true);
  if (!open) return null;
  const workingSheets = Math.max(1, Math.round(elements * 0.7));
  return (
    <Dialog
      title="Tender pack (PDF, A3 landscape) and drawing (SVG)"
      testId="pack-dialog"
      onClose={close}
      footer={
        <>
          <button type="button" onClick={close}>
            Cancel
          </button>
          <button
            type="button"
            data-testid="svg-download"
            title="The single-line diagram alone, as on the pack's diagram sheet, for other drawings"
            onClick={() => {
              close();
              void exportDrawingSvg();
            }}
          >
            Download drawing (SVG)
          </button>
          <button
            type="button"
            className="dl-primary"
            data-testid="pack-download"
            onClick={() => {
              close();
              void exportTenderPack({ working });
            }}
          >
            Download PDF
          </button>
        </>
      }
    >
      <p>Every sheet has a title block from the project details and the caution line. The pack holds:</p>
      <ul>
        <li>
          the single-line diagram, with each cable’s drop and each load’s status (a large one over several
          sheets with a key plan);
        </li>
        <li>
          a summary: project, settings, conductor data, drop limits, standards and editions, methods and
          assumptions, and the cautions;
        </li>
        {onPlan && (
          <li>
            the site plan: the plan picture with each element where it stands and each cable along its
            measured route;
          </li>
        )}
        {alternatives > 0 && (
          <li>
            the design set against each of its {alternatives}{' '}
            {alternatives === 1 ? 'alternative' : 'alternatives'}: loads that changed status, drops that
            moved, cables changed, conductor metal;
          </li>
        )}
        <li>the cable, load and board schedules, and every finding;</li>
        <li>
          <label>
            <input
              type="checkbox"
              checked={working}
              onChange={(e) => setWorking(e.target.checked)}
              data-testid="pack-working"
            />{' '}
            the working behind every figure: formula, inputs with units and sources, result (about{' '}
            {workingSheets} {workingSheets === 1 ? 'sheet' : 'sheets'})
          </label>
        </li>
      </ul>
      <p>
        The drawing alone is also offered as SVG: the same single-line diagram, a large one whole at a legible
        scale, under a line with the project, the data used and the caution.
      </p>
      <p className="dl-note">{CAUTIONS[0]}</p>
    </Dialog>
  );
}
