import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { Review, Role } from '@photon-ledger/shared';
import { reviewQueryOptions } from '../api/get-review';
import { ReviewPanel } from './review-panel';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const missionId = '00000000-0000-4000-8000-000000000001';
const studyId = '00000000-0000-4000-8000-000000000002';
const person = { id: '00000000-0000-4000-8000-000000000003', displayName: 'Ines Okafor', email: 'ines.okafor@example.test' };
const inReview: Review = {
  id: '00000000-0000-4000-8000-000000000004',
  missionId,
  subjectType: 'study',
  subjectId: studyId,
  state: 'in-review',
  submittedBy: person,
  submittedAt: '2026-12-02T05:00:00.000Z',
  decidedBy: null,
  decidedAt: null,
  reason: null,
  note: null,
  frozen: null,
  intact: null,
  updatedAt: '2026-12-02T05:00:00.000Z',
};

function renderPanel(review: Review, role: Role) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  client.setQueryData(reviewQueryOptions(missionId, 'study', studyId).queryKey, review);
  return render(
    <QueryClientProvider client={client}>
      <ReviewPanel missionId={missionId} subjectType="study" subjectId={studyId} role={role} />
    </QueryClientProvider>,
  );
}

describe('ReviewPanel', () => {
  it('gives a reviewer no review control', () => {
    renderPanel(inReview, 'reviewer');
    expect(screen.getByText('In review')).toBeTruthy();
    expect(screen.queryAllByRole('button')).toHaveLength(0);
  });

  it('lets an engineer submit a draft but not approve', () => {
    renderPanel({ ...inReview, state: 'draft', submittedBy: null, submittedAt: null }, 'engineer');
    expect(screen.getByRole('button', { name: 'Submit for review' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Approve and freeze' })).toBeNull();
  });

  it('asks a lead for a reason at the field before sending back, without calling the API', () => {
    const fetchSpy = vi.fn();
    vi.stubGlobal('fetch', fetchSpy);
    renderPanel(inReview, 'lead');
    expect(screen.getByRole('button', { name: 'Approve and freeze' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Send back…' }));
    fireEvent.click(screen.getByRole('button', { name: 'Send back with this reason' }));
    const field = screen.getByLabelText('Reason for sending back (required)');
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/reason is required/)).toBeTruthy();
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('shows the approved hash and says when the content no longer matches it', () => {
    const hash = 'a'.repeat(64);
    renderPanel({ ...inReview, state: 'approved', decidedBy: person, decidedAt: '2026-12-02T05:10:00.000Z', frozen: { contentHash: hash, ids: {}, frozenAt: '2026-12-02T05:10:00.000Z' }, intact: false }, 'lead');
    expect(screen.getByText(`SHA-256 ${hash}`)).toBeTruthy();
    expect(screen.getByText('content no longer matches the approved hash')).toBeTruthy();
    expect(screen.queryAllByRole('button')).toHaveLength(0);
  });
});
