/**
 * A tolerance written once after a list (`61 63 58 60 ± 1`) applies to every item, as the marks'
 * help says; read item by item it would sit on the last mark only and make the range too narrow.
 */
import { checkItem } from './check.js';
import { ReadError, type Read } from './cursor.js';
import type { RawItem } from './item.js';
import type { ReadContext } from './measure.js';
import type { ListRead } from './parse-list.js';
import type { QuantitySpec } from './types.js';

/**
 * The list with a trailing tolerance put on every item that has no spread of its own. Unchanged
 * when the last item has no tolerance, or when every item has its own spread. Some items with a
 * spread and some without, then a tolerance last, is ambiguous and gets a message.
 * @example readList of `61 63 ± 1` gives [61, {63, 62..64}]; this makes it [{61, 60..62}, {63, 62..64}]
 */
export function tolerancesForAll(
  list: ListRead,
  spec: QuantitySpec & { item: string },
): Read<ListRead & { shared?: string }> {
  const last = list.raws.at(-1);
  if (!last || last.form !== 'tol' || list.raws.length < 2) return list;
  const earlier = list.raws.slice(0, -1);
  const bare = earlier.filter((r) => r.form === 'single');
  if (bare.length === 0) return list;
  if (bare.length !== earlier.length)
    return new ReadError(
      `${spec.field}: a tolerance after the last ${spec.item} is taken for every ${spec.item}, but some already have their own range; give each ${spec.item} its own, or one tolerance after the list only`,
    );
  const ctx: ReadContext = { field: spec.field, kind: spec.kind, units: spec.units, inList: true };
  const values = [...list.values];
  const asTyped = [...list.asTyped];
  // Conversion notes of the re-read items are written again below, with their tolerance.
  const reread = bare.map((_, i) => `${spec.item} ${i + 1}: `);
  const notes = list.notes.filter((n) => !reread.some((p) => n.startsWith(p)));
  for (const [i, raw] of bare.entries()) {
    if (raw.form !== 'single') continue;
    const tol: RawItem = {
      form: 'tol',
      v: raw.v,
      tol: last.tol,
      text: `${raw.text} ± ${last.tol.text}`,
    };
    const label = `${spec.item} ${i + 1}`;
    const checked = checkItem(tol, spec, ctx);
    if (checked instanceof ReadError) return new ReadError(`${label}: ${checked.message}`);
    values[i] = checked.value;
    asTyped[i] = !checked.converted;
    if (checked.converted) notes.push(`${label}: ${checked.converted}`);
  }
  const at = (n: string) => Number(/^\S+ (\d+):/.exec(n)?.[1] ?? 0);
  notes.sort((a, b) => at(a) - at(b));
  return {
    ...list,
    values,
    asTyped,
    notes,
    shared: `± ${last.tol.text} taken for every ${spec.item}`,
  };
}
