/** Choice lists for the details forms, with plain labels. Trade terms keep their usual names. */
import { LOAD_KINDS, PHASES } from '../../model/types.ts';
import { LOAD_KIND_LABELS } from '../../export/labels.ts';

const opt = (value: string, label: string) => ({ value, label });

export const PHASE_COUNT_OPTIONS = [opt('1', 'Single-phase'), opt('3', 'Three-phase')];
export const PHASE_OPTIONS = PHASES.map((p) => opt(p, p));
export const EARTHING_OPTIONS = [opt('TN-S', 'TN-S'), opt('TN-C-S', 'TN-C-S'), opt('TT', 'TT')];
export const ZE_SOURCE_OPTIONS = [
  opt('declared', 'Declared by the supply company'),
  opt('measured', 'Measured on site'),
];
export const OWNERSHIP_OPTIONS = [
  opt('public', 'Public supply'),
  opt('private', 'Private (own transformer)'),
];

export const LOAD_KIND_OPTIONS = LOAD_KINDS.map((k) => opt(k, LOAD_KIND_LABELS[k] ?? k));
export const CATEGORY_OPTIONS = [opt('lighting', 'Lighting limit'), opt('other', 'Other uses limit')];
export const DEMAND_UNIT_OPTIONS = [opt('W', 'W'), opt('kW', 'kW'), opt('kVA', 'kVA'), opt('A', 'A')];

export const MATERIAL_OPTIONS = [opt('Cu', 'Copper'), opt('Al', 'Aluminium')];
export const INSULATION_OPTIONS = [
  opt('thermoplastic70', 'Thermoplastic, 70 °C'),
  opt('thermosetting90', 'Thermosetting, 90 °C'),
];
export const CONSTRUCTION_OPTIONS = [
  opt('flatTwinEarth', 'Flat twin and earth'),
  opt('multicore', 'Multicore, non-armoured'),
  opt('armouredMulticore', 'Multicore, armoured'),
  opt('singleCore', 'Single-core'),
];
export const CPC_KIND_OPTIONS = [
  opt('core', 'A core of the cable'),
  opt('separate', 'Separate conductor'),
  opt('armour', 'The armour'),
];
export const CPC_MATERIAL_OPTIONS = [opt('Cu', 'Copper'), opt('Al', 'Aluminium'), opt('steel', 'Steel')];
export const DEVICE_TYPE_OPTIONS = [
  opt('mcb', 'Circuit-breaker (IEC 60898-1)'),
  opt('rcbo', 'RCBO'),
  opt('fuseGG', 'gG fuse'),
  opt('mccb', 'Moulded-case breaker'),
];
export const CURVE_OPTIONS = [opt('B', 'Type B'), opt('C', 'Type C'), opt('D', 'Type D')];
export const RCD_TYPE_OPTIONS = [opt('AC', 'AC'), opt('A', 'A'), opt('F', 'F'), opt('B', 'B')];
export const METHOD_OPTIONS = [
  opt('clippedDirect', 'Clipped direct (C)'),
  opt('conduitOnWall', 'In conduit or trunking on a wall (B)'),
  opt('conduitInInsulatedWall', 'In conduit in an insulated wall (A)'),
  opt('trayOrFreeAir', 'On perforated tray or in free air (E/F)'),
  opt('buriedDirect', 'Buried direct (D2)'),
  opt('buriedDuct', 'Buried in a duct (D1)'),
  opt('inInsulation', 'Surrounded by thermal insulation'),
  opt('aboveInsulation', 'On a joist, touching insulation'),
];
export const ARRANGEMENT_OPTIONS = [
  opt('bunched', 'Bunched or enclosed'),
  opt('singleLayer', 'Single layer on a surface'),
  opt('tray', 'Single layer on tray'),
];

export const LIMIT_PROFILE_OPTIONS = [
  opt('iecPublic', 'IEC 60364-5-52 Annex G, public supply (3 % lighting, 5 % other)'),
  opt('iecPrivate', 'IEC 60364-5-52 Annex G, private supply (6 % lighting, 8 % other)'),
  opt('nec', 'NEC informational notes (3 % branch, 5 % feeder plus branch)'),
  opt('asnzs', 'AS/NZS 3000 (5 %)'),
  opt('custom', 'Custom limits'),
];
