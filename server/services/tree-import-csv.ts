/** Reading a batch CSV (`stage,tank,height_cm,pot_height_cm,pot_mass_kg,note`) into checked rows; no I/O. */
import { TreeStage, type ImportRow } from '../../shared/schemas/nursery.schema.js';
import { ValidationError } from '../errors.js';

export const IMPORT_COLUMNS = ['stage', 'tank', 'height_cm', 'pot_height_cm', 'pot_mass_kg', 'note'] as const;
type Column = (typeof IMPORT_COLUMNS)[number];
/** A batch arrives in the nursery; planted, alive or lost trees are not imported. */
const IMPORT_STAGES: readonly TreeStage[] = ['collected', 'tube', 'potted', 'brining', 'ready'];
const MAX_ROWS = 1000;

/**
 * RFC 4180 records with the line each starts on: quoted cells may hold commas, quotes ("")
 * and line breaks; CRLF or LF; a leading byte-order mark is dropped.
 * @example parseCsv('a,b\n"x, y",2') // [{ line: 1, cells: ['a', 'b'] }, { line: 2, cells: ['x, y', '2'] }]
 */
export function parseCsv(text: string): { line: number; cells: string[] }[] {
  const s = text.replace(/^\uFEFF/, '');
  const records: { line: number; cells: string[] }[] = [];
  let cells: string[] = [];
  let cell = '';
  let quoted = false;
  let line = 1;
  let start = 1;
  const endRecord = () => {
    records.push({ line: start, cells: [...cells, cell] });
    cells = [];
    cell = '';
  };
  for (let i = 0; i < s.length; i++) {
    const c = s[i]!;
    if (c === '\n') line++;
    if (quoted && c === '"' && s[i + 1] === '"') {
      cell += '"';
      i++;
    } else if (c === '"' && (quoted || cell === '')) {
      quoted = !quoted;
    } else if (quoted || (c !== ',' && c !== '\n' && c !== '\r')) {
      cell += c;
    } else if (c === ',') {
      cells.push(cell);
      cell = '';
    } else if (c === '\n' || s[i + 1] !== '\n') {
      // LF, CRLF (ends on its LF) or a lone CR.
      if (c === '\r') line++;
      endRecord();
      start = line;
    }
  }
  if (cell !== '' || cells.length > 0) endRecord();
  return records;
}

const isColumn = (name: string): name is Column => IMPORT_COLUMNS.some((c) => c === name);

function headerOf(cells: string[]): Column[] {
  const names = cells.map((c) => c.trim().toLowerCase());
  const columns = names.filter(isColumn);
  const unknown = names.filter((n) => !isColumn(n));
  if (unknown.length > 0 || new Set(names).size !== names.length) {
    throw new ValidationError('The first line must be the header', { csv: [`the first line must name the columns (${IMPORT_COLUMNS.join(',')}); unknown or repeated: ${unknown.join(', ') || 'repeated column'}`] });
  }
  return columns;
}

function numberCell(raw: string, label: string, max: number, errors: string[]): number | null {
  if (raw === '') return null;
  const n = Number(raw);
  if (!Number.isFinite(n) || n < 0 || n > max) {
    errors.push(`${label}: "${raw}" must be a number from 0 to ${max}`);
    return null;
  }
  return n;
}

function readRow(line: number, cells: string[], header: Column[], tanks: ReadonlyMap<string, { id: string }>): ImportRow {
  const errors: string[] = [];
  if (cells.length > header.length) errors.push(`has ${cells.length} values; the header names ${header.length} columns`);
  const get = (col: Column) => (cells[header.indexOf(col)] ?? '').trim();
  const stage = get('stage').toLowerCase() || 'collected';
  const known = TreeStage.safeParse(stage);
  if (!known.success || !IMPORT_STAGES.includes(known.data)) errors.push(`stage: "${stage}" must be one of ${IMPORT_STAGES.join(', ')}`);
  const tank = get('tank');
  const tankId = tank === '' ? null : (tanks.get(tank.toLowerCase())?.id ?? null);
  if (tank !== '' && !tankId) errors.push(`tank: no tank is named "${tank}"`);
  const note = get('note');
  if (note.length > 500) errors.push('note: at most 500 characters');
  const values = {
    stage,
    tank,
    tankId,
    heightCm: numberCell(get('height_cm'), 'height_cm', 500, errors),
    potHeightCm: numberCell(get('pot_height_cm'), 'pot_height_cm', 200, errors),
    potMassKg: numberCell(get('pot_mass_kg'), 'pot_mass_kg', 500, errors),
    note,
  };
  return { line, ok: errors.length === 0, errors, values };
}

/**
 * Every data row checked against the columns' rules and the nursery's tanks (matched by name,
 * ignoring case). Blank lines are skipped. A missing or unknown header is a 400 on `csv`.
 */
export function readImportCsv(csv: string, tanks: ReadonlyMap<string, { id: string }>): { rows: ImportRow[]; valid: boolean } {
  const [head, ...data] = parseCsv(csv);
  if (!head) throw new ValidationError('The CSV is empty', { csv: ['is empty'] });
  const header = headerOf(head.cells);
  const records = data.filter((r) => r.cells.some((c) => c.trim() !== ''));
  if (records.length > MAX_ROWS) throw new ValidationError('Too many rows', { csv: [`at most ${MAX_ROWS} trees per import`] });
  const rows = records.map((r) => readRow(r.line, r.cells, header, tanks));
  return { rows, valid: rows.length > 0 && rows.every((r) => r.ok) };
}

/** The rows' errors as ErrorBody fields, `rows.<line>` → messages. */
export const rowErrorFields = (rows: readonly ImportRow[]) => Object.fromEntries(rows.filter((r) => !r.ok).map((r) => [`rows.${r.line}`, r.errors]));
