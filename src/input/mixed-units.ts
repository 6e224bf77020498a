/**
 * A list that mixes feet and metres (`61ft 63m`) is almost always a slip (common practice): the
 * entry in the minority system is named, so the investigator can check it before it is taken.
 */
import type { UnitSystem } from '../engine/types.js';
import { measures, type RawItem } from './item.js';

const METRIC = new Set(['m', 'cm', 'mm', 'km', 'km/h', 'm/s', 'kg', 'N', 'kN']);
const IMPERIAL = new Set(['ft', 'in', 'yd', 'mph', 'ft/s', 'lb']);

/** The unit system of a typed unit id (`ft`, `km/h`), or undefined for units of neither (`%`, `s`). */
export function systemOfUnit(id: string): UnitSystem | undefined {
  return METRIC.has(id) ? 'metric' : IMPERIAL.has(id) ? 'imperial' : undefined;
}

/** The units typed in one item, with the system they belong to. */
function typedSystems(raw: RawItem): { unit: string; system: UnitSystem }[] {
  const out: { unit: string; system: UnitSystem }[] = [];
  for (const m of measures(raw))
    for (const p of m.parts) {
      const system = p.unit && systemOfUnit(p.unit.id);
      if (system) out.push({ unit: p.unit!.id, system });
    }
  return out;
}

/**
 * The message naming the entries that look out of place when the items' typed units come from
 * both systems, or undefined when they do not. The minority system is the odd one out; on a tie,
 * the one that is not the case's.
 * @example mixedUnitsMessage(raws of `61ft 63m`, 'imperial', 'mark') // "mark 2 (63m) is in metres, ..."
 */
export function mixedUnitsMessage(
  raws: readonly RawItem[],
  caseUnits: UnitSystem,
  item: string,
): string | undefined {
  const per = raws.map(typedSystems);
  const count = { imperial: 0, metric: 0 };
  for (const list of per) for (const t of list) count[t.system]++;
  if (count.imperial === 0 || count.metric === 0) return undefined;
  const odd: UnitSystem =
    count.imperial === count.metric
      ? caseUnits === 'imperial'
        ? 'metric'
        : 'imperial'
      : count.imperial < count.metric
        ? 'imperial'
        : 'metric';
  const other: UnitSystem = odd === 'imperial' ? 'metric' : 'imperial';
  const named = raws
    .map((r, i) => ({ r, i }))
    .filter(({ i }) => per[i]!.some((t) => t.system === odd))
    .map(({ r, i }) => `${item} ${i + 1} (${r.text.trim()})`);
  const unitsIn = (s: UnitSystem) => [
    ...new Set(per.flatMap((l) => l.filter((t) => t.system === s).map((t) => t.unit))),
  ];
  const verb = named.length === 1 ? 'is' : 'are';
  return `${named.join(', ')} ${verb} in ${unitsIn(odd).join('/')} while the others are in ${unitsIn(other).join('/')}: a list that mixes the two systems is almost always a slip`;
}
