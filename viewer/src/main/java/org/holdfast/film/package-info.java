/**
 * Films: where the camera is at each film second ({@link org.holdfast.film.CameraTrack}:
 * keyframes, or the {@code orbit} and {@code approach} presets), which simulated time each
 * film second shows ({@link org.holdfast.film.FilmClock}), and the {@code [film]} table of a
 * scenario file that sets them ({@link org.holdfast.film.FilmReader}). The {@code holdfast render}
 * command ({@link org.holdfast.film.RenderCommand}) decides the film from that table and its
 * options ({@link org.holdfast.film.FilmPlan}), draws the frames of a replayed run, skips frames
 * already finished, and hands the folder to ffmpeg for a video.
 */
package org.holdfast.film;
