/** Plain labels for document values that the editor's forms and the exports both show. */

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
