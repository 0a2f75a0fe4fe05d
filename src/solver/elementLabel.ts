/**
 * How a message names an element: its kind word and id, then its name in brackets where it has one
 * that differs from the id ("cable C7 (Sub-main to the store)", "board DB2"). The id is always
 * there, so a message still points somewhere when names are blank or repeated.
 */
import type { Cable } from '../model/types.ts';

/** @example elementLabel('load', 'L4', 'Kiln heater') // 'load L4 (Kiln heater)' */
export function elementLabel(word: string, id: string, name: unknown): string {
  return typeof name === 'string' && name !== '' && name !== id ? `${word} ${id} (${name})` : `${word} ${id}`;
}

/** @example cableLabel({ id: 'C2', name: '' }) // 'cable C2' */
export function cableLabel(cable: Pick<Cable, 'id' | 'name'>): string {
  return elementLabel('cable', cable.id, cable.name);
}
