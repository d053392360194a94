import { budgetLineDefinitions, type BudgetLineKey } from '@photon-ledger/srp-core';

/** Fields most studies vary, with their units; any other numeric field can be typed as a path. */
export const commonStudyPaths: readonly { path: string; label: string }[] = [
  { path: 'vehicle.massKg', label: 'Vehicle mass' },
  { path: 'vehicle.areaM2', label: 'Sail or sphere area' },
  { path: 'vehicle.centreOfMassM.0', label: 'Centre of mass, x' },
  { path: 'vehicle.centreOfMassM.1', label: 'Centre of mass, y' },
  { path: 'vehicle.centreOfMassM.2', label: 'Centre of mass, z' },
  { path: 'vehicle.plates.0.areaM2', label: 'Plate 0 area' },
  { path: 'vehicle.plates.0.front.specular', label: 'Plate 0 front, specular fraction' },
  { path: 'vehicle.plates.0.front.diffuse', label: 'Plate 0 front, diffuse fraction' },
  { path: 'scenario.attitude.coneDeg', label: 'Sail cone angle' },
  { path: 'scenario.spanDays', label: 'Span' },
];

/** The unit of a field from its name (our field names end in their unit). */
export function pathUnit(path: string): string {
  const last = path.split('.').filter((k) => !/^\d+$/.test(k)).pop() ?? '';
  if (/M2$/.test(last)) return 'm²';
  if (/Kg$/.test(last)) return 'kg';
  if (/Deg$/.test(last)) return 'deg';
  if (/Days$/.test(last)) return 'days';
  if (/Km$/.test(last)) return 'km';
  if (/M$/.test(last)) return 'm';
  if (/S$/.test(last)) return 's';
  return '–';
}

/** Optical fraction names (a dispersed one needs a companion that takes the rest). */
export const opticalFractions = ['absorbed', 'specular', 'diffuse'] as const;
export const isOpticalFraction = (path: string) => (opticalFractions as readonly string[]).includes(path.split('.').pop() ?? '');

export const lineLabel = (key: string) => budgetLineDefinitions[key as BudgetLineKey]?.label ?? key;

/** A line's unit, written for display (m/s^2 → m/s²). */
export function lineUnit(key: string): string {
  const unit = budgetLineDefinitions[key as BudgetLineKey]?.unit ?? '';
  return unit.replaceAll('^2', '²').replaceAll('*', '·');
}

/** A value with four significant figures, in exponent form when very small or large. */
export function formatValue(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  return abs < 1e-3 || abs >= 1e6 ? value.toExponential(3) : Number(value.toPrecision(4)).toString();
}
