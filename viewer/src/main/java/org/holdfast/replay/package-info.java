/**
 * Replaying a finished run: {@link org.holdfast.replay.RunArchive} opens a run folder (its HDF5
 * snapshots, {@code tracks.csv} and {@code summary.json}), {@link org.holdfast.replay.ReplayScene}
 * fills the renderer's scene for any time between the first and last snapshot, and
 * {@link org.holdfast.window.RunFrameSource} draws those scenes for {@code holdfast view}.
 */
package org.holdfast.replay;
