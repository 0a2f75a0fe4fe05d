/** The name field every node kind has. */
import type { NodeElement } from '../../model/types.ts';

export const nameField = <E extends NodeElement>() =>
  ({
    kind: 'text',
    key: 'name',
    label: 'Name',
    required: true,
    get: (el: E) => el.name,
    set: (_el: E, name: string) => ({ name }) as Partial<E>,
  }) as const;
