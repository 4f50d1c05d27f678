import { Button, HTMLSelect, Tag } from '@blueprintjs/core';
import type { ActivityEntry, TrialDetail } from '@friable/contracts';
import { useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { formatNumber } from '../../../lib/format';
import { personDateFormat } from '../../../lib/person-locale';
import { useActivity } from '../api/get-activity';
import { activityGroups, activityKindLabel, kindMatches } from './activity-kinds';


/** The most entries the API answers at once. */
const LIST_LIMIT = 1000;

/** A person who may appear in the trail: the trial's members, plus anyone named in it who has since left. */
export interface ActivityPerson {
  userId: number;
  name: string;
}

function peopleToOffer(people: ActivityPerson[], entries: ActivityEntry[]): ActivityPerson[] {
  const byId = new Map<number, string>();
  for (const person of people) byId.set(person.userId, person.name);
  for (const entry of entries) if (entry.userId !== null && !byId.has(entry.userId)) byId.set(entry.userId, entry.userName ?? `Person ${entry.userId}`);
  return [...byId].map(([userId, name]) => ({ userId, name })).sort((a, b) => a.name.localeCompare(b.name));
}

/** Activity: the trial's audit trail, newest first, narrowed by person, site and kind of change. */
export function ActivityPage({ trial, people }: { trial: TrialDetail; people: ActivityPerson[] }) {
  const [params, setParams] = useSearchParams();
  const userId = Number(params.get('person')) || undefined;
  const siteId = Number(params.get('site')) || undefined;
  const kind = params.get('kind') ?? '';
  // The API filters by one exact kind; a whole group is narrowed here from the person's and site's entries.
  const activity = useActivity(trial.id, { kind: kind.includes('.') ? kind : undefined, siteId, userId });
  const entries = (activity.data ?? []).filter((entry) => kindMatches(entry.kind, kind));
  const siteName = new Map(trial.sites.map((site) => [site.id, site.name]));
  const filtered = Boolean(userId || siteId || kind);

  function choose(key: 'person' | 'site' | 'kind', value: string) {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  }

  return (
    <section className="fr-activity" aria-labelledby="activity-heading">
      <h3 id="activity-heading" className="bp6-heading fr-activity__heading">
        Activity
      </h3>
      <div className="fr-activity__filters" role="group" aria-label="Filters">
        <label className="fr-site-picker">
          <span>Person</span>
          <HTMLSelect aria-label="Person" value={userId ?? ''} onChange={(event) => choose('person', event.target.value)}>
            <option value="">Everyone</option>
            {peopleToOffer(people, activity.data ?? []).map((person) => (
              <option key={person.userId} value={person.userId}>
                {person.name}
              </option>
            ))}
          </HTMLSelect>
        </label>
        <label className="fr-site-picker">
          <span>Site</span>
          <HTMLSelect aria-label="Site" value={siteId ?? ''} onChange={(event) => choose('site', event.target.value)}>
            <option value="">All sites</option>
            {trial.sites.map((site) => (
              <option key={site.id} value={site.id}>
                {site.name}
              </option>
            ))}
          </HTMLSelect>
        </label>
        <label className="fr-site-picker">
          <span>Kind of change</span>
          <HTMLSelect aria-label="Kind of change" value={kind} onChange={(event) => choose('kind', event.target.value)}>
            <option value="">All changes</option>
            {activityGroups.map((group) => (
              <optgroup key={group.prefix} label={group.label}>
                <option value={group.prefix}>All: {group.label.toLowerCase()}</option>
                {Object.entries(group.kinds).map(([value, label]) => (
                  <option key={value} value={value}>
                    {label}
                  </option>
                ))}
              </optgroup>
            ))}
          </HTMLSelect>
        </label>
        {filtered && <Button variant="minimal" icon="filter-remove" text="Show all changes" onClick={() => setParams(new URLSearchParams(), { replace: true })} />}
      </div>

      {activity.isPending ? (
        <LoadingState what="the activity" />
      ) : activity.isError ? (
        <ErrorState title="The activity could not be loaded" error={activity.error} onRetry={() => activity.refetch()} />
      ) : entries.length === 0 ? (
        filtered ? (
          <EmptyState title="No changes match" description="Nothing in this trial’s activity fits these filters. Choose another person, site or kind of change." />
        ) : (
          <EmptyState title="No activity yet" description="Every change to this trial — its protocol, sites, team and values — will be listed here, newest first." />
        )
      ) : (
        <>
          <p className="fr-muted fr-small">
            {activity.data.length >= LIST_LIMIT ? `The newest ${formatNumber(LIST_LIMIT, 0)} changes` : `${formatNumber(entries.length, 0)} ${entries.length === 1 ? 'change' : 'changes'}`}
            {filtered ? ' matching the filters' : ''}, newest first.
          </p>
          <ol className="fr-activity__list" aria-label="Changes, newest first">
            {entries.map((entry) => (
              <li key={entry.id} className="fr-activity__entry">
                <time className="fr-activity__when" dateTime={entry.at}>
                  {personDateFormat('weekday-moment', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }).format(new Date(entry.at))}
                </time>
                <div className="fr-activity__what">
                  <p className="fr-activity__summary">{entry.summary}</p>
                  <p className="fr-activity__meta">
                    <Tag minimal className="fr-activity__kind">
                      {activityKindLabel(entry.kind)}
                    </Tag>
                    <span>by {entry.userName ?? 'Friable'}</span>
                    {entry.siteId !== null && <span>at {siteName.get(entry.siteId) ?? 'a removed site'}</span>}
                  </p>
                </div>
              </li>
            ))}
          </ol>
        </>
      )}
    </section>
  );
}
