import type { FindingsAnswer } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { LRUCache } from 'lru-cache';
import { createHash } from 'node:crypto';
import { requireInteger } from '../config/validate-environment';
import { DataStampsService } from '../data-stamps/data-stamps.service';
import { canonicalHash } from './canonical-hash';
import type { FindingsQueryDto } from './dto/findings-query.dto';

/** An answer as it goes out: its JSON text, written once, and the entity tag of that text. */
export interface ServedFindings {
  body: Buffer;
  etag: string;
}

interface CachedFindings {
  /** The data stamp read before the answer was computed (data-stamps/data-stamps.service.ts). */
  stamp: string;
  /** The snapshot hash of the analysed data (context.dataHash). */
  dataHash: string;
  answer: FindingsAnswer;
  /** The answer written out, once, for GET /findings. */
  out: ServedFindings;
}

function served(answer: FindingsAnswer): ServedFindings {
  const body = Buffer.from(JSON.stringify(answer), 'utf8');
  return { body, etag: `W/"${createHash('sha256').update(body).digest('base64url').slice(0, 27)}"` };
}

/** The cache key: trial, measure, round, site and every analysis option (choices left out stay out). */
export function findingsKey(trialId: number, query: FindingsQueryDto): string {
  return `${trialId}:${canonicalHash({ ...query })}`;
}

/**
 * Findings cache — Findings answers kept per API instance, keyed by trial, measure, round, scope and options,
 * each stored with the data stamp read before it was computed and with the snapshot hash of its data.
 * An answer is served only while the stamp of its trial (and of the whole instance) is unchanged: every
 * write through any instance replaces that stamp (DataStampsInterceptor), so one primary-key read decides.
 * Concurrent requests for the same answer share one computation. Refusals (422) are not kept.
 * Answers are kept as the JSON text that goes out, with its entity tag, so serving one writes nothing anew.
 *
 * Bounded by FINDINGS_CACHE_MB (default 64) of answer text; least recently used answers go first.
 * Example: `cache.answer(trialId, query, () => findings.findings(trialId, query))`; `cache.served(…)` → `{ body, etag }`.
 */
@Injectable()
export class FindingsCache {
  private readonly answers = new LRUCache<string, CachedFindings>({
    maxSize: requireInteger(process.env, 'FINDINGS_CACHE_MB', 64, 1, 4096) * 1_048_576,
    // The text written out stands for the answer's size (the parsed answer takes about as much again).
    sizeCalculation: (entry) => Math.max(1, entry.out.body.length),
  });
  private readonly pending = new Map<string, Promise<CachedFindings>>();
  /** Hits and misses since start (read by the benchmark through the log, and by tests). */
  readonly counts = { hits: 0, misses: 0 };

  constructor(private readonly stamps: DataStampsService) {}

  async answer(trialId: number, query: FindingsQueryDto, compute: () => Promise<FindingsAnswer>): Promise<FindingsAnswer> {
    return (await this.entry(trialId, query, compute)).answer;
  }

  /** The same answer as its JSON text and entity tag, as GET /findings sends it. */
  async served(trialId: number, query: FindingsQueryDto, compute: () => Promise<FindingsAnswer>): Promise<ServedFindings> {
    return (await this.entry(trialId, query, compute)).out;
  }

  private async entry(trialId: number, query: FindingsQueryDto, compute: () => Promise<FindingsAnswer>): Promise<CachedFindings> {
    const key = findingsKey(trialId, query);
    // The stamp is read before the data: an answer is never stored under a stamp newer than its data.
    const stamp = await this.stamps.read(trialId);
    const cached = this.answers.get(key);
    if (cached?.stamp === stamp) {
      this.counts.hits += 1;
      return cached;
    }
    const flightKey = `${key}@${stamp}`;
    const inFlight = this.pending.get(flightKey);
    if (inFlight) {
      this.counts.hits += 1;
      return inFlight;
    }
    this.counts.misses += 1;
    const computation = compute()
      .then((answer) => {
        const entry: CachedFindings = { stamp, dataHash: answer.context.dataHash, answer, out: served(answer) };
        this.answers.set(key, entry);
        return entry;
      })
      .finally(() => this.pending.delete(flightKey));
    this.pending.set(flightKey, computation);
    return computation;
  }
}
