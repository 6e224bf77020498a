import { caseV1, type CaseV1 } from './v1/schema.js';
import { fromZod, type FieldIssue } from './issues.js';
import { MIGRATIONS, migrate, oldestVersion, type MigrationTable } from './migrate.js';
import { unknownFields } from './unknown-fields.js';
import { scanJson } from './json-scan.js';
import { MAX_CASE_BYTES, MAX_DEPTH, TOO_DEEP, tooLargeMessage } from './limits.js';

/** The case type the rest of the program works with: always the latest version. */
export type Case = CaseV1;
export const LATEST_VERSION = 1;
export const FORMAT = 'skidcase-case';

/** How a file of a version newer than this program is described, wherever it is shown. */
export const NEWER_WORDS = 'written by a newer skidcase';

/** True when a problem message says the file comes from a newer skidcase (not that it is damaged). */
export function isNewerFileProblem(message: string): boolean {
  return message.includes(NEWER_WORDS);
}

export type LoadResult =
  | {
      ok: true;
      case: Case;
      migratedFrom?: number;
      unknownFields: string[];
      /** Paths of keys the file gives twice in one object; the last one is used (a warning). */
      duplicateKeys: string[];
    }
  | { ok: false; kind: 'json' | 'format' | 'newer' | 'invalid'; issues: FieldIssue[] };

/** The issues with exact repeats (one rule checked at several ends of one number) dropped. */
function withoutRepeats(issues: FieldIssue[]): FieldIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => {
    const key = `${i.path}\u0000${i.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/**
 * Reads a case from parsed JSON: checks the format, migrates older versions to the latest in
 * memory, validates, and lists fields the schema does not know (kept, but worth a warning).
 * `migrations` is the table of steps between versions (`MIGRATIONS`; tests pass their own).
 */
export function loadCase(input: unknown, migrations: MigrationTable = MIGRATIONS): LoadResult {
  if (typeof input !== 'object' || input === null || Array.isArray(input))
    return {
      ok: false,
      kind: 'format',
      issues: [{ path: '(file)', message: 'a case file is a JSON object' }],
    };
  const obj = input as Record<string, unknown>;
  if (obj.format !== FORMAT)
    return {
      ok: false,
      kind: 'format',
      issues: [
        { path: 'format', message: `format must be "${FORMAT}" (is this a skidcase case file?)` },
      ],
    };
  const version = obj.version;
  const oldest = oldestVersion(migrations, LATEST_VERSION);
  if (typeof version !== 'number' || !Number.isInteger(version) || version < oldest)
    return {
      ok: false,
      kind: 'invalid',
      issues: [{ path: 'version', message: `version must be a whole number from ${oldest}` }],
    };
  if (version > LATEST_VERSION)
    return {
      ok: false,
      kind: 'newer',
      issues: [
        {
          path: 'version',
          message: `${NEWER_WORDS} (file version ${version}; this one reads up to version ${LATEST_VERSION}): update skidcase to open it`,
        },
      ],
    };
  const migrated = migrate(obj, version, LATEST_VERSION, migrations);
  if (!migrated.ok)
    return {
      ok: false,
      kind: 'invalid',
      issues: [{ path: 'version', message: `no migration from version ${migrated.missing}` }],
    };
  const parsed = caseV1.safeParse(migrated.value);
  if (!parsed.success)
    return { ok: false, kind: 'invalid', issues: withoutRepeats(fromZod(parsed.error)) };
  const result: LoadResult = {
    ok: true,
    case: parsed.data,
    unknownFields: unknownFields(parsed.data),
    duplicateKeys: [],
  };
  if (version < LATEST_VERSION) result.migratedFrom = version;
  return result;
}

/**
 * Parses text (a file's contents) then loads it; a JSON syntax error is a `json` failure, and so
 * is a text beyond the size or nesting limits (docs/case-file.md), checked before it is parsed.
 * Keys given twice in one object are listed in `duplicateKeys`.
 */
export function loadCaseText(text: string, migrations: MigrationTable = MIGRATIONS): LoadResult {
  // UTF-16 code units never outnumber UTF-8 bytes, so this holds for the file's bytes too.
  if (text.length > MAX_CASE_BYTES)
    return {
      ok: false,
      kind: 'json',
      issues: [{ path: '(file)', message: tooLargeMessage(text.length) }],
    };
  const scan = scanJson(text, MAX_DEPTH);
  if (scan.tooDeep)
    return { ok: false, kind: 'json', issues: [{ path: '(file)', message: TOO_DEEP }] };
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    return {
      ok: false,
      kind: 'json',
      issues: [{ path: '(file)', message: `not valid JSON (${msg})` }],
    };
  }
  const loaded = loadCase(json, migrations);
  if (loaded.ok) loaded.duplicateKeys = scan.duplicateKeys;
  return loaded;
}
