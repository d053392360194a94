import { useEffect, useRef, useState } from 'react';
import { missionRegimes, type MissionRegime } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';
import { regimeLabels } from './regime-label';

/** Props of MissionFilters. */
export interface MissionFiltersProps {
  /** The chosen regime; undefined means all. */
  regime: MissionRegime | undefined;
  /** The search text as it stands in the URL. */
  search: string;
  onRegimeChange: (regime: MissionRegime | undefined) => void;
  /** Called a moment after the user stops typing. */
  onSearchChange: (search: string) => void;
}

const searchDelayMs = 250;

/** The regime filter and the text search of the mission list. */
export function MissionFilters({ regime, search, onRegimeChange, onSearchChange }: MissionFiltersProps) {
  const [draft, setDraft] = useState(search);
  const sent = useRef(search);
  const onSearchChangeRef = useRef(onSearchChange);
  onSearchChangeRef.current = onSearchChange;

  // The URL changed from outside (back button, "Clear filters"): show what it says.
  useEffect(() => {
    if (search !== sent.current) {
      sent.current = search;
      setDraft(search);
    }
  }, [search]);

  useEffect(() => {
    if (draft === sent.current) return;
    const timer = setTimeout(() => {
      sent.current = draft;
      onSearchChangeRef.current(draft);
    }, searchDelayMs);
    return () => clearTimeout(timer);
  }, [draft]);

  const options: Array<{ value: MissionRegime | undefined; label: string }> = [
    { value: undefined, label: 'All' },
    ...missionRegimes.map((value) => ({ value, label: regimeLabels[value] })),
  ];

  return (
    <div className="flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 text-sm font-medium">Regime</legend>
        <div className="inline-flex w-fit rounded-md border border-rule-strong bg-paper-raised p-0.5">
          {options.map((option) => {
            const checked = option.value === regime;
            return (
              <label
                key={option.label}
                className={cx(
                  'cursor-pointer rounded px-3 py-1.5 text-sm has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-sodium',
                  checked ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
                )}
              >
                <input
                  type="radio"
                  name="regime"
                  className="sr-only"
                  checked={checked}
                  onChange={() => onRegimeChange(option.value)}
                />
                {option.label}
              </label>
            );
          })}
        </div>
      </fieldset>
      <div className="flex flex-col gap-1 sm:w-72">
        <label htmlFor="mission-search" className="text-sm font-medium">
          Search missions
        </label>
        <input
          id="mission-search"
          type="search"
          value={draft}
          maxLength={120}
          placeholder="Name or summary"
          onChange={(event) => setDraft(event.target.value)}
          className="h-9 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm placeholder:text-ink-soft/70 focus-visible:border-sodium"
        />
      </div>
    </div>
  );
}
