/**
 * The CPU renderer for films and stills. A {@link org.holdfast.render.SceneFrame} says what is
 * in view at one instant; a {@link org.holdfast.render.FrameRenderer} turns it, seen from a
 * {@link org.holdfast.render.CameraPose} through a
 * {@link org.holdfast.render.projection.Projection}, into light in a
 * {@link org.holdfast.render.LightBuffer} (additive Gaussian splats for stars and flow
 * tracers, anti-aliased fading trails for galaxy centres), then into 8-bit pixels through a
 * {@link org.holdfast.render.Stretch}, and finally draws the switchable text overlays.
 * {@link org.holdfast.render.FrameFiles} writes numbered PNG frames safely.
 *
 * <p>All per-frame storage is allocated once and reused; the parallel stages are arranged so
 * that the same input gives byte-identical frames on any number of threads.
 */
package org.holdfast.render;
