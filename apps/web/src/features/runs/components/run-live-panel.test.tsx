import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import type { Run } from '@photon-ledger/shared';
import { RunLivePanel } from './run-live-panel';
import { formatProgress } from './run-progress-bar';

afterEach(cleanup);

const base: Run = {
  id: '00000000-0000-4000-8000-000000000001',
  missionId: '00000000-0000-4000-8000-000000000002',
  scenarioId: '00000000-0000-4000-8000-000000000003',
  scenarioName: 'GEO 3 days',
  vehicleRevisionId: '00000000-0000-4000-8000-000000000004',
  status: 'running',
  progress: 0.4237,
  cancelRequested: false,
  errorMessage: null,
  workerId: 'vm:24636:0',
  attempts: 1,
  rerunOf: null,
  createdBy: null,
  queuedAt: '2026-12-02T04:00:00.000Z',
  startedAt: '2026-12-02T04:00:02.000Z',
  heartbeatAt: '2026-12-02T04:01:14.500Z',
  finishedAt: null,
};
const now = Date.parse('2026-12-02T04:01:15.000Z');

describe('formatProgress', () => {
  it('shows whole percents and never 100 % before the end', () => {
    expect(formatProgress(0.4237)).toBe('42 %');
    expect(formatProgress(0.9995)).toBe('99 %');
    expect(formatProgress(1)).toBe('100 %');
    expect(formatProgress(-0.2)).toBe('0 %');
  });
});

describe('RunLivePanel', () => {
  it('shows a running run as a progressbar with its percentage, elapsed time, worker and attempts', () => {
    render(<RunLivePanel run={base} now={now} />);
    const bar = screen.getByRole('progressbar', { name: 'Run progress' });
    expect(bar.getAttribute('aria-valuenow')).toBe('42');
    expect(bar.getAttribute('aria-valuetext')).toBe('42 %');
    expect(screen.getByText('42 %')).toBeTruthy();
    expect(screen.getByText('Propagating the orbit')).toBeTruthy();
    expect(screen.getByText('1 min 13 s')).toBeTruthy();
    expect(screen.getByText('0.5 s ago')).toBeTruthy();
    expect(screen.getByText('vm:24636:0')).toBeTruthy();
    expect(screen.getByText('1')).toBeTruthy();
  });

  it('shows a queued run as waiting, without a percentage, timed from when it was queued', () => {
    render(<RunLivePanel run={{ ...base, status: 'queued', progress: 0, startedAt: null, heartbeatAt: null, workerId: null }} now={now} />);
    const bar = screen.getByRole('progressbar', { name: 'Run progress' });
    expect(bar.getAttribute('aria-valuenow')).toBeNull();
    expect(screen.getAllByText('Waiting for a worker').length).toBeGreaterThan(0);
    expect(screen.getByText('1 min 15 s')).toBeTruthy();
    expect(screen.getByText('none yet')).toBeTruthy();
  });

  it('says the run is being cancelled once a cancel was asked for', () => {
    render(<RunLivePanel run={{ ...base, cancelRequested: true }} now={now} />);
    expect(screen.getByText('Cancelling…')).toBeTruthy();
  });
});
