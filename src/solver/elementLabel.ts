/**
 * How a message names an element: its kind word and id, then its name in brackets where it has one
 * that differs from the id ("cable C7 (Sub-main to the store)", "board DB2"). The id is always
 * there, so a message still points somewhere when names are blank or repeated.
 */
import type { Cable } from '../model/types.ts';

/**
 * A name that has brackets of its own is quoted instead, so it does not read as brackets within
 * brackets.
 * @example elementLabel('load', 'L4', 'Kiln heater') // 'load L4 (Kiln heater)'
 * @example elementLabel('load', 'L9', 'Yard lights (rear)') // 'load L9 “Yard lights (rear)”'
 */
export function elementLabel(word: string, id: string, name: unknown): string {
  if (typeof name !== 'string' || name === '' || name === id) return `${word} ${id}`;
  return /[()]/.test(name) ? `${word} ${id} “${name}”` : `${word} ${id} (${name})`;
}

/** @example cableLabel({ id: 'C2', name: '' }) // 'cable C2' */
export function cableLabel(cable: Pick<Cable, 'id' | 'name'>): string {
  return elementLabel('cable', cable.id, cable.name);
}
