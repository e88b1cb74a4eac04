/**
 * Films: where the camera is at each film second ({@link org.holdfast.film.CameraTrack}:
 * keyframes, or the {@code orbit} and {@code approach} presets), which simulated time each
 * film second shows ({@link org.holdfast.film.FilmClock}), and the {@code [film]} table of a
 * scenario file that sets them ({@link org.holdfast.film.FilmReader}).
 */
package org.holdfast.film;
