/** The fields of a cable's protective device at its sending end, RCD included. */
import type { Cable, Device } from '../../model/types.ts';
import type { FieldGroup, NumberField, NumberRule } from './fieldSpec.ts';
import { CURVE_OPTIONS, DEVICE_TYPE_OPTIONS, RCD_TYPE_OPTIONS } from './options.ts';

type P = Partial<Cable>;

// Offered when the user ticks "Device fitted"; visible in the form at once so the user replaces
// it with the real device.
const DEVICE_OFFER: Device = { type: 'mcb', curve: 'B', ratingA: 32, breakingKa: 6 };

function deviceNumber(
  key: keyof Device & string,
  label: string,
  unit: string,
  rule: NumberRule,
  shown: (d: Device) => boolean = () => true,
): NumberField<Cable, P> {
  return {
    kind: 'number',
    key: `device.${key}`,
    label,
    unit,
    rule,
    shown: (c) => c.device !== undefined && shown(c.device),
    get: (c) => c.device?.[key] as number | undefined,
    set: (c, v) => ({ device: { ...DEVICE_OFFER, ...c.device, [key]: v } }),
  };
}

export const DEVICE_GROUP: FieldGroup<Cable, P> = {
  title: 'Protective device (sending end)',
  fields: [
    {
      kind: 'toggle',
      key: 'device',
      label: 'Device fitted',
      get: (c) => c.device !== undefined,
      set: (_c, on) => ({ device: on ? { ...DEVICE_OFFER } : undefined }),
    },
    {
      kind: 'choice',
      key: 'device.type',
      label: 'Type',
      options: DEVICE_TYPE_OPTIONS,
      shown: (c) => c.device !== undefined,
      get: (c) => c.device?.type ?? 'mcb',
      set: (c, v) => ({ device: { ...DEVICE_OFFER, ...c.device, type: v as Device['type'] } }),
    },
    {
      kind: 'choice',
      key: 'device.curve',
      label: 'Curve',
      options: CURVE_OPTIONS,
      shown: (c) => c.device?.type === 'mcb' || c.device?.type === 'rcbo',
      get: (c) => c.device?.curve ?? 'B',
      set: (c, v) => ({ device: { ...DEVICE_OFFER, ...c.device, curve: v as Device['curve'] } }),
    },
    deviceNumber('ratingA', 'Rating In', 'A', { min: 0, minExclusive: true, max: 6300 }),
    deviceNumber('breakingKa', 'Breaking capacity', 'kA', { min: 0, minExclusive: true, max: 200 }),
    deviceNumber(
      'irMultiple',
      'Long-time setting Ir (× In)',
      '',
      { min: 0.4, max: 1 },
      (d) => d.type === 'mccb',
    ),
    deviceNumber(
      'imMultiple',
      'Instantaneous setting Im (× Ir)',
      '',
      { min: 1.5, max: 20 },
      (d) => d.type === 'mccb',
    ),
    {
      kind: 'toggle',
      key: 'device.rcd',
      label: 'RCD fitted',
      shown: (c) => c.device !== undefined,
      get: (c) => c.device?.rcd !== undefined,
      set: (c, on) => ({
        device: { ...DEVICE_OFFER, ...c.device, rcd: on ? { type: 'A', idnMa: 30 } : undefined },
      }),
    },
    {
      kind: 'choice',
      key: 'device.rcd.type',
      label: 'RCD type',
      options: RCD_TYPE_OPTIONS,
      shown: (c) => c.device?.rcd !== undefined,
      get: (c) => c.device?.rcd?.type ?? 'A',
      set: (c, v) => ({
        device: {
          ...DEVICE_OFFER,
          ...c.device,
          rcd: { idnMa: 30, ...c.device?.rcd, type: v as 'AC' | 'A' | 'F' | 'B' },
        },
      }),
    },
    {
      kind: 'number',
      key: 'device.rcd.idnMa',
      label: 'Rated residual current IΔn',
      unit: 'mA',
      rule: { min: 0, minExclusive: true, max: 3000 },
      shown: (c) => c.device?.rcd !== undefined,
      get: (c) => c.device?.rcd?.idnMa,
      set: (c, idnMa) => ({
        device: { ...DEVICE_OFFER, ...c.device, rcd: { type: 'A', ...c.device?.rcd, idnMa } },
      }),
    },
  ],
};
