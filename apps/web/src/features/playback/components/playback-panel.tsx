import type { RunSummary } from '@photon-ledger/shared';

/** Props of the 3D playback of a succeeded run (loaded lazily by the run page). */
export interface PlaybackPanelProps {
  missionId: string;
  runId: string;
  summary: RunSummary;
}

/** 3D playback of a run: orbit view and body view driven by a time scrubber (being built). */
export default function PlaybackPanel(_props: PlaybackPanelProps) {
  return <p className="text-sm text-ink-soft">3D playback is being built.</p>;
}
