import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import type { CensoredAnswer, CountsAnswer, OrdinalAnswer, RepeatedAnswer } from '@friable/contracts';
import { analyseCensoredTimes, analyseCounts, analyseOrdinalScores, analyseRepeatedMeasures, analyseTrial, blocksForPower, friedman, kruskalWallis, rcbdPower, type TrialAnalysis, type TrialAnalysisRequest } from '@friable/stats';
import type { AnovaRequestDto } from './dto/anova-request.dto';
import type { CensoredRequestDto } from './dto/censored-request.dto';
import type { CountsRequestDto, OrdinalRequestDto } from './dto/labelled-value-request.dto';
import type { RepeatedRequestDto } from './dto/repeated-request.dto';
import type { PowerRequestDto } from './dto/power-request.dto';
import type { RankTestRequestDto } from './dto/rank-test-request.dto';

/** Runs the statistics engine; a statistically impossible request becomes 422 with the engine's sentence. */
function engine<T>(compute: () => T): T {
  try {
    return compute();
  } catch (error) {
    if (error instanceof RangeError) {
      throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message: error.message });
    }
    throw error;
  }
}

function requireLabel(value: string | undefined, row: number, field: string): string {
  if (value === undefined) throw new RangeError(`observations[${row}].${field} is needed for this test`);
  return value;
}

/** The engine's frozen result as plain JSON data (NaN and ±Infinity become null, as JSON writes them). */
const plain = <T>(value: unknown): T => JSON.parse(JSON.stringify(value)) as T;

/** A rank test's value (its observation list refuses null, so none reaches here). */
const toNumber = (value: number | string | null) => (typeof value === 'number' ? value : Number(value));

@Injectable()
export class StatsService {
  anova(request: AnovaRequestDto): TrialAnalysis {
    return engine(() => analyseTrial(request as TrialAnalysisRequest));
  }

  censored(request: CensoredRequestDto): CensoredAnswer {
    return engine(() => plain(analyseCensoredTimes(request)));
  }

  repeated(request: RepeatedRequestDto): RepeatedAnswer {
    return engine(() => plain(analyseRepeatedMeasures(request)));
  }

  ordinal(request: OrdinalRequestDto): OrdinalAnswer {
    return engine(() => plain(analyseOrdinalScores(request)));
  }

  counts(request: CountsRequestDto): CountsAnswer {
    return engine(() => plain(analyseCounts(request)));
  }

  friedman(request: RankTestRequestDto) {
    return engine(() => {
      const result = friedman(
        request.observations.map((o, row) => ({
          treatment: requireLabel(o.treatment, row, 'treatment'),
          block: o.site === undefined ? requireLabel(o.block, row, 'block') : `${o.site}\u0000${requireLabel(o.block, row, 'block')}`,
          value: toNumber(o.value),
        })),
      );
      return { statistic: result.statistic, df: result.df, p: result.p, blocksUsed: result.blocksUsed, droppedBlocks: result.droppedBlocks.map((b) => b.replace('\u0000', ' / ')) };
    });
  }

  kruskal(request: RankTestRequestDto) {
    return engine(() => {
      const result = kruskalWallis(request.observations.map((o, row) => ({ treatment: requireLabel(o.treatment, row, 'treatment'), value: toNumber(o.value) })));
      return { statistic: result.statistic, df: result.df, p: result.p };
    });
  }

  power(request: PowerRequestDto) {
    const common = { treatments: request.treatments, cv: request.cv, difference: request.difference, alpha: request.alpha ?? 0.05, sites: request.sites ?? 1 };
    if (request.blocks !== undefined) {
      return engine(() => ({ ...rcbdPower({ ...common, blocks: request.blocks as number }), blocks: request.blocks }));
    }
    if (request.targetPower !== undefined) {
      return engine(() => blocksForPower({ ...common, targetPower: request.targetPower as number }));
    }
    throw new UnprocessableEntityException({
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: 'Give blocks (to get the power) or targetPower (to get the blocks needed).',
      errors: [{ field: 'blocks', message: 'blocks or targetPower is needed' }],
    });
  }
}
