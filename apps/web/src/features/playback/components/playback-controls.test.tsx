import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { PlaybackControls, type PlaybackControlsProps } from './playback-controls';
import { PlaybackReadouts } from './playback-readouts';
import { createPlaybackState } from '../lib/series-track';

afterEach(cleanup);

function renderControls(overrides: Partial<PlaybackControlsProps> = {}) {
  const props: PlaybackControlsProps = {
    epochUtc: '2026-09-08T00:00:00.000Z',
    tStart: 0,
    tEnd: 172_800,
    t: 78_972,
    outputStepSeconds: 300,
    playing: false,
    speed: 10,
    loop: false,
    shadows: [{ body: 'earth', depth: 'umbra', fromT: 79_137, toT: 82_195 }],
    onTogglePlay: vi.fn(),
    onSeek: vi.fn(),
    onSpeed: vi.fn(),
    onLoop: vi.fn(),
    ...overrides,
  };
  render(<PlaybackControls {...props} />);
  return props;
}

describe('PlaybackControls', () => {
  it('names the scrubber and shows the UTC time beside it', () => {
    renderControls();
    const slider = screen.getByRole('slider', { name: 'Playback time' });
    expect(slider.getAttribute('aria-valuetext')).toBe('2026-09-08 21:56:12 UTC');
    expect(screen.getByText('2026-09-08 21:56:12 UTC')).toBeTruthy();
  });

  it('seeks, toggles play and picks a speed stated in simulated time per second', () => {
    const props = renderControls();
    fireEvent.change(screen.getByRole('slider', { name: 'Playback time' }), { target: { value: '1000' } });
    expect(props.onSeek).toHaveBeenCalledWith(1000);
    fireEvent.click(screen.getByRole('button', { name: 'Play' }));
    expect(props.onTogglePlay).toHaveBeenCalled();
    const speed = screen.getByLabelText('Speed');
    expect(screen.getByRole('option', { name: '10× (50 min/s)' })).toBeTruthy();
    fireEvent.change(speed, { target: { value: '100' } });
    expect(props.onSpeed).toHaveBeenCalledWith(100);
  });

  it('offers Pause while playing', () => {
    renderControls({ playing: true });
    expect(screen.getByRole('button', { name: 'Pause' })).toBeTruthy();
  });
});

describe('PlaybackReadouts', () => {
  it('gives the time, |r| in km, the illuminated fraction and |a_srp| with units, as text', () => {
    const state = createPlaybackState();
    state.tSeconds = 3600;
    state.positionM = [42_164_000, 0, 0];
    state.srpAccelInertialMps2 = [1e-7, 0, 0];
    state.srpAccelBodyMps2 = [0, 1e-7, 0];
    state.illuminatedFraction = 0.5;
    render(<PlaybackReadouts epochUtc="2026-09-08T00:00:00Z" centralBody="earth" state={state} massKg={4200} sunDirectionEci={[1, 0, 0]} />);
    expect(screen.getByText('2026-09-08 01:00:00 UTC')).toBeTruthy();
    expect(screen.getByText('42,164 km')).toBeTruthy();
    expect(screen.getByText('0.500 (partial shadow)')).toBeTruthy();
    expect(screen.getByText('1.00 × 10⁻⁷ m/s²')).toBeTruthy();
    expect(screen.getByText('4.20 × 10⁻⁴ N')).toBeTruthy();
  });
});
