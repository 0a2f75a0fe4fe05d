import { useId, useState, type KeyboardEvent } from 'react';
import { formatNumber, optionsOf, parseNumber, parseText, type FieldSpec, type Parsed } from './fieldSpec.ts';

interface Props<E, P> {
  spec: FieldSpec<E, P>;
  element: E;
  /** How messages name the element, e.g. `cable C3 "Kitchen ring"`. */
  owner: string;
  /** Called with a patch only when the value is valid and different; returns a refusal, if any. */
  onCommit: (patch: P) => string | undefined;
}

/**
 * One editable field. Text and number fields keep what the user typed until it is valid: a bad
 * value stays in place, marked, with the reason under it, and never reaches the document.
 */
export function FieldRow<E, P>({ spec, element, owner, onCommit }: Props<E, P>) {
  const id = useId();
  if (spec.kind === 'toggle') {
    return (
      <div className="dl-field dl-field-wide">
        <label>
          <input
            type="checkbox"
            checked={spec.get(element)}
            onChange={(e) => onCommit(spec.set(element, e.target.checked))}
          />{' '}
          {spec.label}
        </label>
      </div>
    );
  }
  if (spec.kind === 'choice') {
    const options = optionsOf(spec, element);
    return (
      <div className="dl-field">
        <label htmlFor={id}>{spec.label}</label>
        <div className="dl-control">
          <select
            id={id}
            value={spec.get(element)}
            title={options.find((o) => o.value === spec.get(element))?.label}
            onChange={(e) => onCommit(spec.set(element, e.target.value))}
          >
            {options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </div>
        {spec.hint && <div className="dl-hint">{spec.hint}</div>}
      </div>
    );
  }
  return <TypedField spec={spec} element={element} owner={owner} onCommit={onCommit} inputId={id} />;
}

type Typed<E, P> = Extract<FieldSpec<E, P>, { kind: 'number' | 'text' }>;

function TypedField<E, P>({
  spec,
  element,
  owner,
  onCommit,
  inputId,
}: Omit<Props<E, P>, 'spec'> & { spec: Typed<E, P>; inputId: string }) {
  const stored = spec.kind === 'number' ? formatNumber(spec.get(element)) : spec.get(element);
  // The draft lives only while the user is editing or while it is invalid.
  const [draft, setDraft] = useState<string | null>(null);
  const [reason, setReason] = useState<string | null>(null);
  const unset = spec.kind === 'number' && spec.unsetPrompt !== undefined && spec.get(element) === 0;
  const shown = draft ?? (unset ? '' : stored);
  const unit = spec.kind === 'number' ? spec.unit : '';
  const hint = unset && spec.kind === 'number' ? spec.unsetPrompt : spec.hint;

  const parse = (text: string): Parsed<number | string> =>
    spec.kind === 'number'
      ? parseNumber(text, spec.label, spec.unit, spec.rule, owner)
      : parseText(text, spec.label, spec.required, owner, spec.check);

  const commit = () => {
    if (draft === null) return;
    const parsed = parse(draft);
    if (!parsed.ok) {
      setReason(parsed.reason);
      return;
    }
    const same =
      spec.kind === 'number' ? parsed.value === spec.get(element) : parsed.value === spec.get(element);
    const refusal = same
      ? undefined
      : onCommit(
          spec.kind === 'number'
            ? spec.set(element, parsed.value as number)
            : spec.set(element, parsed.value as string),
        );
    if (refusal) {
      setReason(refusal);
      return;
    }
    setDraft(null);
    setReason(null);
  };

  const onKey = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') commit();
    if (e.key === 'Escape') {
      setDraft(null);
      setReason(null);
    }
  };

  const reasonId = `${inputId}-reason`;
  return (
    <div className="dl-field">
      <label htmlFor={inputId}>{spec.label}</label>
      <div className="dl-control">
        <input
          id={inputId}
          type="text"
          inputMode={spec.kind === 'number' ? 'decimal' : undefined}
          value={shown}
          placeholder={unset ? 'not set' : undefined}
          aria-invalid={reason ? true : undefined}
          aria-describedby={reason ? reasonId : undefined}
          data-field={spec.key}
          onChange={(e) => {
            setDraft(e.target.value);
            if (reason) setReason(null);
          }}
          onBlur={commit}
          onKeyDown={onKey}
        />
        <span className="dl-unit">{unit}</span>
      </div>
      {reason ? (
        <div className="dl-reason" id={reasonId} role="alert">
          {reason}
        </div>
      ) : (
        hint && <div className={unset ? 'dl-hint dl-hint-unset' : 'dl-hint'}>{hint}</div>
      )}
    </div>
  );
}
