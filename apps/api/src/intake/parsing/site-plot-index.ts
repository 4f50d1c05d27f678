import { setImmediate as yieldToOthers } from 'node:timers/promises';
import type { SitePlot } from './validate-intake';

/** A plot label as it is matched: surrounding spaces and case do not count. */
export const plotLabelKey = (label: string): string => {
  const trimmed = label.trim();
  const upper = trimmed.toUpperCase();
  return upper === trimmed ? trimmed : upper;
};

const FNV_OFFSET = 0x811c9dc5;
/** Plots hashed between two turns of the event loop while the index is built. */
const SEAL_SLICE = 50_000;
const FNV_PRIME = 0x01000193;

/** FNV-1a over the UTF-16 code units of a key. */
function hashOf(key: string): number {
  let hash = FNV_OFFSET;
  for (let index = 0; index < key.length; index += 1) hash = Math.imul(hash ^ key.charCodeAt(index), FNV_PRIME);
  return hash >>> 0;
}

function grown<T extends Int32Array | Uint16Array>(array: T, size: number, make: (length: number) => T): T {
  if (size < array.length) return array;
  const next = make(Math.max(16, array.length * 2));
  next.set(array);
  return next;
}

/**
 * Site plot index — the plots of one site by label, kept in a few flat arrays so a site of a
 * million plots takes tens of megabytes rather than hundreds, and a lookup allocates nothing.
 *
 * Purpose: Intake checks every row of a file against the plot plan while the file streams by.
 * Labels match without regard to case or surrounding spaces. The keys (upper-case labels) are
 * kept end to end in one string with their offsets; an open-addressing table of positions,
 * probed by an FNV-1a hash, finds a key by comparing characters in place.
 * Reference: Fowler–Noll–Vo hash, FNV-1a, https://datatracker.ietf.org/doc/html/draft-eastlake-fnv
 * Throws: RangeError when a plot is added after the first lookup.
 * Example: `SitePlotIndex.of([{ id: 101, label: 'HL-B1-P01', block: 1, treatmentCode: 'CTRL' }]).find(' hl-b1-p01 ')` → 0
 */
export class SitePlotIndex {
  private keyParts: string[] = [];
  private keys = '';
  private offsets = new Int32Array(16);
  private ids = new Int32Array(16);
  private blocks = new Int32Array(16);
  private codeIndexes = new Uint16Array(16);
  private readonly codes: string[] = [];
  private readonly codeNumbers = new Map<string, number>();
  /** Labels whose spelling differs from their key (lower case, spaces), by position. */
  private readonly spellings = new Map<number, string>();
  private readonly identities = new Map<number, Readonly<Record<string, string>>>();
  private table: Int32Array | null = null;
  private count = 0;
  private keyLength = 0;

  static of(plots: readonly SitePlot[]): SitePlotIndex {
    const index = new SitePlotIndex();
    for (const plot of plots) index.add(plot);
    return index;
  }

  get size(): number {
    return this.count;
  }

  add(plot: SitePlot): void {
    if (this.table) throw new RangeError('SitePlotIndex.add: plots are added before the first lookup');
    const position = this.count;
    const key = plotLabelKey(plot.label);
    this.offsets = grown(this.offsets, position + 1, (length) => new Int32Array(length));
    this.ids = grown(this.ids, position, (length) => new Int32Array(length));
    this.blocks = grown(this.blocks, position, (length) => new Int32Array(length));
    this.codeIndexes = grown(this.codeIndexes, position, (length) => new Uint16Array(length));
    this.offsets[position] = this.keyLength;
    this.keyParts.push(key);
    this.keyLength += key.length;
    this.offsets[position + 1] = this.keyLength;
    if (key !== plot.label) this.spellings.set(position, plot.label);
    this.ids[position] = plot.id;
    this.blocks[position] = plot.block;
    let code = this.codeNumbers.get(plot.treatmentCode);
    if (code === undefined) {
      code = this.codes.length;
      this.codes.push(plot.treatmentCode);
      this.codeNumbers.set(plot.treatmentCode, code);
    }
    this.codeIndexes[position] = code;
    if (plot.identity) this.identities.set(position, plot.identity);
    this.count += 1;
  }

  /** The position of the plot with this label (case and surrounding spaces aside), or −1. */
  find(label: string): number {
    const table = this.table ?? this.seal();
    const key = plotLabelKey(label);
    const mask = table.length - 1;
    for (let slot = hashOf(key) & mask; ; slot = (slot + 1) & mask) {
      const entry = table[slot]!;
      if (entry === 0) return -1;
      if (this.keyIs(entry - 1, key)) return entry - 1;
    }
  }

  id(position: number): number {
    return this.ids[position]!;
  }

  /** How many plots, and their lowest and highest id (a re-randomized site has other ids). */
  idSummary(): { count: number; lowest: number; highest: number } {
    let lowest = Number.POSITIVE_INFINITY;
    let highest = 0;
    for (let position = 0; position < this.count; position += 1) {
      lowest = Math.min(lowest, this.ids[position]!);
      highest = Math.max(highest, this.ids[position]!);
    }
    return { count: this.count, lowest: this.count ? lowest : 0, highest };
  }

  /** The label as the plot plan writes it. */
  label(position: number): string {
    return this.spellings.get(position) ?? this.keys.slice(this.offsets[position], this.offsets[position + 1]);
  }

  block(position: number): number {
    return this.blocks[position]!;
  }

  treatmentCode(position: number): string {
    return this.codes[this.codeIndexes[position]!]!;
  }

  identity(position: number, role: string): string | undefined {
    return this.identities.get(position)?.[role];
  }

  private keyIs(position: number, key: string): boolean {
    const start = this.offsets[position]!;
    if (this.offsets[position + 1]! - start !== key.length) return false;
    for (let index = 0; index < key.length; index += 1) if (this.keys.charCodeAt(start + index) !== key.charCodeAt(index)) return false;
    return true;
  }

  /**
   * Joins the keys and builds the table (at most half full) once every plot is in, a slice of
   * `SEAL_SLICE` plots at a time between which other requests get their turn.
   */
  async ready(): Promise<void> {
    if (this.table) return;
    const build = this.startSeal();
    while (!build.next().done) await yieldToOthers();
  }

  private seal(): Int32Array {
    const build = this.startSeal();
    while (!build.next().done);
    return this.table!;
  }

  private *startSeal(): Generator<void, void> {
    this.keys = this.keyParts.join('');
    this.keyParts = [];
    let capacity = 16;
    while (capacity < this.count * 2) capacity *= 2;
    const table = new Int32Array(capacity);
    const mask = capacity - 1;
    for (let position = 0; position < this.count; position += 1) {
      if (position % SEAL_SLICE === SEAL_SLICE - 1) yield;
      const key = this.keys.slice(this.offsets[position], this.offsets[position + 1]);
      let slot = hashOf(key) & mask;
      while (table[slot] !== 0 && !this.keyIs(table[slot]! - 1, key)) slot = (slot + 1) & mask;
      // A label twice (case aside) keeps its first plot, as the plot plan cannot hold both.
      if (table[slot] === 0) table[slot] = position + 1;
    }
    this.table = table;
  }
}
