import type { IntakeProblem } from '@friable/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError, problemOf, UNREACHABLE_MESSAGE } from '../../../lib/api-client';
import type { paths } from '../../../lib/api-schema';
import { trialQueryOptions } from '../../../lib/api/get-trial';
import { session } from '../../../lib/session';
import { intakeColumnsQueryOptions } from './get-intake-columns';
import { intakeImportsQueryOptions } from './get-intake-imports';

type IntakeRoute = paths['/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/intake']['post'];
/** The 200 answer of the intake (also for a dry run), as the API documents it. */
export type IntakeAnswer = IntakeRoute['responses'][200]['content']['application/json'];

/** What the person's choice of column means: a role, a measure code, or null (not read). */
export type ColumnChoice = 'plotLabel' | 'block' | 'treatment' | 'notes' | 'missingReason' | string | null;

export interface IntakeSubmission {
  trialId: number;
  siteId: number;
  roundId: number;
  file: File;
  /** Only the columns the person mapped differently from the automatic matching (header → choice). */
  mapping: Record<string, ColumnChoice>;
  acceptWarnings: boolean;
  /** The reason for NA values of rows that give none, for the whole file. */
  missingReason?: string;
  dryRun: boolean;
  /** Share of the file sent so far, 0 to 1, from the browser's own upload progress events. */
  onProgress?: (fraction: number) => void;
  /** This upload's name, to follow the server's stages at GET …/intake-imports while it runs. */
  ticket?: string;
  /** For a workbook: the sheet to read (the server reads the first visible one without it). */
  sheet?: string;
}

/** A fresh upload name: 32 hexadecimal digits (getRandomValues works on plain http too, unlike randomUUID). */
export function newTicket(): string {
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (byte) => byte.toString(16).padStart(2, '0')).join('');
}

/** The server's refusal of a file: nothing was written; `problems` name the row and column of each. */
export class IntakeRefusedError extends ApiError {
  override name = 'IntakeRefusedError';
  get problems(): IntakeProblem[] {
    return (this.details ?? []).map((detail) => ({ row: detail.row ?? null, column: detail.column ?? null, message: detail.message }));
  }
}

function readBody(request: XMLHttpRequest): unknown {
  try {
    return JSON.parse(request.responseText);
  } catch {
    return {};
  }
}

/**
 * POST /api/trials/:trialId/sites/:siteId/rounds/:roundId/intake (multipart: `file`, `mapping` JSON when
 * the person changed it, `acceptWarnings`, `missingReason` for the whole file when chosen, a workbook's `sheet`), with `?dryRun=true` for the check before the commit.
 * XMLHttpRequest rather than the typed client's fetch, because only it reports real upload progress;
 * it carries the session the same way (lib/session.ts).
 * Rejects with IntakeRefusedError (422, every problem listed) or ApiError (any other failure).
 */
export function submitIntake({ trialId, siteId, roundId, file, mapping, acceptWarnings, missingReason, dryRun, onProgress, ticket, sheet }: IntakeSubmission): Promise<IntakeAnswer> {
  const form = new FormData();
  // The fields go before the file, so the server has them while the file is still arriving.
  if (ticket) form.append('ticket', ticket);
  if (sheet) form.append('sheet', sheet);
  if (Object.keys(mapping).length > 0) form.append('mapping', JSON.stringify(mapping));
  form.append('acceptWarnings', acceptWarnings ? 'true' : 'false');
  if (missingReason) form.append('missingReason', missingReason);
  form.append('file', file, file.name);
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', `/api/trials/${trialId}/sites/${siteId}/rounds/${roundId}/intake${dryRun ? '?dryRun=true' : ''}`);
    const credentials = session.credentialHeaders();
    for (const [name, value] of Object.entries(credentials)) request.setRequestHeader(name, value);
    request.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    request.onerror = () => reject(new ApiError(0, UNREACHABLE_MESSAGE));
    request.onload = () => {
      session.answered(request.status, Object.keys(credentials).length > 0);
      const body = readBody(request);
      if (request.status >= 200 && request.status < 300) {
        onProgress?.(1);
        resolve(body as IntakeAnswer);
        return;
      }
      const problem = problemOf(request, body);
      reject(request.status === 422 ? new IntakeRefusedError(problem.status, problem.message, problem.details) : problem);
    };
    request.send(form);
  });
}

/**
 * A dry run or a commit; a commit loads the trial's observations (and the site's "has data" flag) and
 * its remembered column choices again. Either way the site and round's list of uploads is asked again.
 */
export function useSubmitIntake(trialId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: submitIntake,
    onSettled: async (_result, _error, submission) => {
      await queryClient.invalidateQueries({ queryKey: intakeImportsQueryOptions(trialId, submission.siteId, submission.roundId).queryKey });
    },
    onSuccess: async (result) => {
      if (result.dryRun) return;
      await queryClient.invalidateQueries({ queryKey: trialQueryOptions(trialId).queryKey });
      await queryClient.invalidateQueries({ queryKey: intakeColumnsQueryOptions(trialId).queryKey });
    },
  });
}
