import { Button, InputGroup, Tag } from '@blueprintjs/core';
import type { Measure, Observation } from '@friable/contracts';
import { findUnit } from '@friable/field';
import { useEffect, useState } from 'react';
import { MissingReasonInput } from '../../../components/missing-reason-input';
import { formatNumber } from '../../../lib/format';
import { measureHeading } from '../../../lib/measure-heading';
import { writeNumber } from '../../../lib/number-reading';
import { cellText } from '../../../lib/observation-text';
import { usePersonLocale } from '../../../lib/person-locale';
import { readValueText } from '../../../lib/value-reading';
import type { QueuedValue } from '../queue/field-queue';
import { clockText, timerState, type DrainTimer } from '../timers/drain-timer';

export interface MeasureCommit {
  value: string;
  notes: string | null;
  missingReason: string | null;
}

/** What is shown for a stored or queued value: "412", ">600", "NA". */
function shownText(stored: Observation | undefined, queued: QueuedValue | undefined): string {
  return queued ? queued.value : cellText(stored);
}

/**
 * One measure of the plot on the walk: a big box for the value (decimal comma or point, ">600",
 * "NA" with a reason), the previous round's value beside it, a note for this measure, and for a
 * time with a cut-off the drain timer. The value is queued when the box is left or Enter is pressed.
 */
export function MeasureEntry({
  measure,
  stored,
  queued,
  previous,
  previousLabel,
  timer,
  now,
  disabled,
  onCommit,
  onStartTimer,
  onStopTimer,
}: {
  measure: Measure;
  stored: Observation | undefined;
  queued: QueuedValue | undefined;
  previous: Observation | undefined;
  previousLabel: string | undefined;
  timer: DrainTimer | undefined;
  now: number;
  disabled: boolean;
  onCommit: (commit: MeasureCommit) => void;
  onStartTimer: () => void;
  onStopTimer: () => void;
}) {
  const locale = usePersonLocale();
  const external = shownText(stored, queued);
  const externalNote = queued ? (queued.notes ?? '') : (stored?.notes ?? '');
  const externalReason = queued ? (queued.missingReason ?? '') : (stored?.missingReason ?? '');
  const [text, setText] = useState(external);
  const [note, setNote] = useState(externalNote);
  const [reason, setReason] = useState(externalReason);
  const [problem, setProblem] = useState<string | null>(null);
  // A value recorded elsewhere (the drain timer, a send that settled a conflict) shows at once.
  useEffect(() => setText(external), [external]);
  useEffect(() => setNote(externalNote), [externalNote]);
  useEffect(() => setReason(externalReason), [externalReason]);

  const reading = readValueText(text, locale);
  const id = `fr-walk-${measure.id}`;
  const heading = measureHeading(measure);

  function commit(next: { text?: string; note?: string; reason?: string } = {}) {
    const typed = next.text ?? text;
    const noteText = (next.note ?? note).trim();
    const reasonText = (next.reason ?? reason).trim();
    const read = readValueText(typed, locale);
    setProblem(null);
    if (read.kind === 'empty') return;
    if (read.kind === 'invalid') {
      setProblem(`“${typed.trim()}” is not a number. Type a number such as 12.5, >${formatNumber(measure.cutoff ?? 600, 4)} when the cut-off was reached, or NA.`);
      return;
    }
    if (read.kind === 'ambiguous') return; // the question below asks which was meant
    if (read.kind === 'missing' && !reasonText) {
      setProblem('A missing value needs a reason: choose one below or type why it is missing.');
      return;
    }
    const value = read.kind === 'missing' ? 'NA' : read.text;
    const unchanged = value === shownText(stored, queued) && noteText === externalNote.trim() && (read.kind !== 'missing' || reasonText === externalReason.trim());
    if (unchanged) return;
    onCommit({ value, notes: noteText || null, missingReason: read.kind === 'missing' ? reasonText : null });
    // Shown back the person's way, so they see what was read ("0,5" → "0.5" in English).
    if (read.kind === 'value') setText(`${read.censored ? '>' : ''}${writeNumber(read.text.replace(/^>/, ''), locale)}`);
  }

  const state = timer ? timerState(timer, now) : null;
  const unitSeconds = findUnit(measure.unit)?.toBase ?? 1;
  const timed = measure.kind === 'time-with-cutoff' && measure.cutoff !== null && findUnit(measure.unit)?.dimension === 'time';

  return (
    <div className="fr-walk-measure" role="group" aria-label={heading}>
      <label htmlFor={id} className="fr-walk-measure__label">
        {heading}
        {measure.kind === 'time-with-cutoff' && measure.cutoff !== null && <span className="fr-muted"> · cut-off {formatNumber(measure.cutoff, 4)}</span>}
      </label>
      <div className="fr-walk-measure__row">
        <InputGroup
          id={id}
          aria-label={heading}
          size="large"
          className="fr-walk-measure__input"
          inputMode="decimal"
          autoComplete="off"
          value={text}
          disabled={disabled}
          intent={problem || reading.kind === 'invalid' ? 'danger' : reading.kind === 'ambiguous' ? 'warning' : 'none'}
          onChange={(event) => setText(event.target.value)}
          onBlur={() => commit()}
          onKeyDown={(event) => {
            if (event.key === 'Enter') commit();
          }}
        />
        <div className="fr-walk-measure__previous">
          {previousLabel ? (
            <>
              <span className="fr-muted fr-small">{previousLabel}</span>
              <strong>{previous ? cellText(previous) : '—'}</strong>
            </>
          ) : (
            <span className="fr-muted fr-small">First round</span>
          )}
        </div>
      </div>
      {reading.kind === 'ambiguous' && (
        <div className="fr-number-question" role="group" aria-label={`What does ${text.trim()} mean?`}>
          <span>“{text.trim()}” could be read two ways. Which did you mean?</span>
          <span className="fr-number-question__choices">
            {[reading.thousands, reading.decimal].map((meaning) => {
              const chosen = `${reading.censored ? '>' : ''}${meaning.decimalText}`;
              return (
                <Button
                  key={chosen}
                  className="fr-touch"
                  text={`${reading.censored ? '>' : ''}${writeNumber(meaning.decimalText, locale)}`}
                  onClick={() => {
                    setText(chosen);
                    commit({ text: chosen });
                  }}
                />
              );
            })}
          </span>
        </div>
      )}
      {reading.kind === 'missing' && (
        <MissingReasonInput
          id={`${id}-reason`}
          label={`Why ${measure.name} is missing`}
          value={reason}
          disabled={disabled}
          large
          onChange={setReason}
          onChoose={(chosen) => commit({ reason: chosen })}
          onBlur={() => commit()}
        />
      )}
      {problem && (
        <p className="fr-walk-measure__problem" role="alert">
          {problem}
        </p>
      )}
      <div className="fr-walk-measure__status">
        {queued?.state === 'waiting' && <Tag intent="primary">Waiting to be sent</Tag>}
        {queued?.state === 'conflict' && <Tag intent="warning">Changed meanwhile — see below</Tag>}
        {queued?.state === 'refused' && <Tag intent="danger">Not accepted — see below</Tag>}
        {!queued && stored && <Tag minimal>Saved</Tag>}
      </div>
      {timed && !disabled && (
        <div className="fr-walk-timer" aria-label={`Drain timer for ${measure.name}`}>
          {state?.kind === 'running' ? (
            <>
              <span className="fr-walk-timer__clock" role="timer">
                {clockText(state.elapsedSeconds)} <span className="fr-muted">of {clockText((measure.cutoff ?? 0) * unitSeconds)}</span>
              </span>
              <Button large intent="success" className="fr-touch" icon="stop" text="Drained — stop" onClick={onStopTimer} />
            </>
          ) : (
            <>
              {state && (
                <span className="fr-walk-timer__clock">
                  {state.kind === 'cut-off' ? `Not drained by the cut-off: ${state.valueText}` : `Drained after ${clockText(state.elapsedSeconds)}: ${state.valueText}`}
                </span>
              )}
              <Button large className="fr-touch" icon="stopwatch" text={state ? 'Time again' : 'Start the drain timer'} onClick={onStartTimer} />
            </>
          )}
        </div>
      )}
      <InputGroup
        aria-label={`Note on ${measure.name}`}
        placeholder={`Note on ${measure.name} (optional)`}
        value={note}
        disabled={disabled}
        onChange={(event) => setNote(event.target.value)}
        onBlur={() => commit({ note })}
      />
    </div>
  );
}
