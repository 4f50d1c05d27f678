import Papa from 'papaparse';
import type { AnalysisObservation, QuickDesign } from '../api/run-anova';

export type ColumnRole = 'treatment' | 'factorA' | 'factorB' | 'block' | 'site' | 'value' | 'ignore';

export interface QuickTable {
  headers: string[];
  rows: string[][];
  /** Why the text is not a usable table, in words; null when it is. */
  problem: string | null;
}

export const columnRoleLabels: Record<ColumnRole, string> = {
  treatment: 'Treatment',
  factorA: 'Factor A',
  factorB: 'Factor B',
  block: 'Block',
  site: 'Site',
  value: 'Value',
  ignore: 'Not used',
};

/**
 * Quick table — reads pasted or uploaded CSV text (comma, semicolon or tab; a header row first) in the
 * browser with papaparse, dropping blank lines. Reference: https://www.papaparse.com/docs. Throws nothing.
 * Example: `readQuickTable('tip,coupon,hardness\n1,1,9.3\n')` → `{ headers: ['tip','coupon','hardness'], rows: [['1','1','9.3']], problem: null }`.
 */
export function readQuickTable(text: string): QuickTable {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, '').trim(), { skipEmptyLines: 'greedy' });
  const [head, ...rows] = parsed.data;
  if (!head || head.every((cell) => cell.trim() === '')) return { headers: [], rows: [], problem: 'There is nothing to read yet: paste the data with a heading row first.' };
  const headers = head.map((cell, index) => cell.trim() || `column ${index + 1}`);
  if (headers.length < 2) return { headers, rows, problem: 'Only one column was found: separate the columns with commas, semicolons or tabs.' };
  if (rows.length === 0) return { headers, rows, problem: 'Only the heading row was found: add the data rows below it.' };
  const ragged = rows.findIndex((row) => row.length !== headers.length);
  if (ragged >= 0) return { headers, rows, problem: `Row ${ragged + 2} has ${rows[ragged]!.length} cells but the heading row has ${headers.length}.` };
  return { headers, rows: rows.map((row) => row.map((cell) => cell.trim())), problem: null };
}

const isNumber = (text: string) => text !== '' && Number.isFinite(Number(text));

/** Roles guessed from the headings (treatment, block, site, value words), else from which columns hold numbers. */
export function guessColumnRoles(table: QuickTable): ColumnRole[] {
  const roles: ColumnRole[] = table.headers.map((header) => {
    const name = header.toLowerCase();
    if (/^(site|garden|location|farm|place)/.test(name)) return 'site';
    if (/^(block|rep|replicate|coupon|bench)/.test(name)) return 'block';
    if (/^(treat|trt|tip|variety|amendment)/.test(name)) return 'treatment';
    if (/^(value|y|response|yield|result|hardness)/.test(name)) return 'value';
    return 'ignore';
  });
  if (!roles.includes('value')) {
    // The last column whose every cell is a number.
    for (let c = table.headers.length - 1; c >= 0; c--) {
      if (roles[c] === 'ignore' && table.rows.every((row) => isNumber(row[c] ?? ''))) {
        roles[c] = 'value';
        break;
      }
    }
  }
  const unused = roles.map((role, c) => (role === 'ignore' ? c : -1)).filter((c) => c >= 0);
  if (!roles.includes('treatment')) {
    if (unused.length >= 2) {
      roles[unused[0]!] = 'factorA';
      roles[unused[1]!] = 'factorB';
    } else if (unused.length === 1) roles[unused[0]!] = 'treatment';
  }
  return roles;
}

/** The design the roles imply: sites → combined over sites; two factors → factorial in blocks; a block → RCBD; else CRD. */
export function guessDesign(roles: readonly ColumnRole[]): QuickDesign {
  if (roles.includes('factorA') && roles.includes('factorB')) return 'factorial-rcbd';
  if (roles.includes('site')) return 'multisite-rcbd';
  if (roles.includes('block')) return 'rcbd';
  return 'crd';
}

/** What each design needs beside a value; a missing column is named. */
export function missingColumns(design: QuickDesign, roles: readonly ColumnRole[]): string[] {
  const needed: ColumnRole[] = ['value'];
  if (design === 'factorial-rcbd') needed.push('factorA', 'factorB', 'block');
  else needed.push('treatment');
  if (design === 'rcbd' || design === 'multisite-rcbd') needed.push('block');
  if (design === 'multisite-rcbd') needed.push('site');
  return needed.filter((role) => !roles.includes(role)).map((role) => columnRoleLabels[role]);
}

/** The rows as the engine takes them, values as the decimal text typed (analysed exactly). */
export function quickObservations(table: QuickTable, roles: readonly ColumnRole[], design: QuickDesign): AnalysisObservation[] {
  const at = (role: ColumnRole) => roles.indexOf(role);
  const [treatment, block, site, value, factorA, factorB] = (['treatment', 'block', 'site', 'value', 'factorA', 'factorB'] as const).map(at);
  return table.rows.map((row) => {
    const observation: AnalysisObservation = { value: row[value!] ?? '' };
    if (design === 'factorial-rcbd') observation.factors = { [table.headers[factorA!]!]: row[factorA!]!, [table.headers[factorB!]!]: row[factorB!]! };
    else observation.treatment = row[treatment!];
    if (design !== 'crd' && block! >= 0) observation.block = row[block!];
    if (design === 'multisite-rcbd') observation.site = row[site!];
    return observation;
  });
}

/** The most decimals any value was typed with (so means get one more). */
export function typedDecimals(observations: readonly AnalysisObservation[]): number {
  return observations.reduce((most, o) => Math.max(most, /\.(\d+)/.exec(String(o.value))?.[1]?.length ?? 0), 0);
}
