/** Plain labels for document values that the editor's forms and the exports both show. */
import type { ProjectDetails } from '../model/types.ts';

/** A load's practical kind, as a person reads it. */
export const LOAD_KIND_LABELS: Readonly<Record<string, string>> = {
  lighting: 'Lighting',
  sockets: 'Socket outlets',
  heating: 'Heating',
  cooking: 'Cooking',
  waterHeating: 'Water heating',
  motor: 'Motor',
  evCharging: 'EV charging',
  hvac: 'Air handling',
  other: 'Other',
};

/** The project's details as label and value, in the order every report and sheet lists them. */
export function projectDetailRows(d: ProjectDetails): [string, string][] {
  return [
    ['Project', d.title],
    ['Client', d.client],
    ['Site', d.site],
    ['Reference', d.reference],
    ['Revision', d.revision],
    ['Author', d.author],
    ['Date', d.date],
  ];
}
