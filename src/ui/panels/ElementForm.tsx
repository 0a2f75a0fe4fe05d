import type { FieldGroup } from './fieldSpec.ts';
import { FieldRow } from './FieldRow.tsx';

interface Props<E, P> {
  groups: FieldGroup<E, P>[];
  element: E;
  owner: string;
  onCommit: (patch: P) => string | undefined;
}

/** Every editable field of an element, in its groups; groups and fields that do not apply are hidden. */
export function ElementForm<E, P>({ groups, element, owner, onCommit }: Props<E, P>) {
  return (
    <form data-testid="element-form" onSubmit={(e) => e.preventDefault()}>
      {groups
        .filter((g) => !g.shown || g.shown(element))
        .map((g) => (
          <fieldset key={g.title} style={{ border: 'none', padding: 0, margin: 0 }}>
            <h3>{g.title}</h3>
            {g.fields
              .filter((f) => !f.shown || f.shown(element))
              .map((f) => (
                <FieldRow key={f.key} spec={f} element={element} owner={owner} onCommit={onCommit} />
              ))}
          </fieldset>
        ))}
    </form>
  );
}
