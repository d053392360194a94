/**
 * Height (CSS px) the 3D playback panel takes on large screens in every state (loading, error,
 * empty, playing): a page may keep this much room while the lazily loaded panel arrives, so
 * nothing jumps. Importing it does not pull in three.js.
 */
export const PLAYBACK_PANEL_HEIGHT_PX = 700;
