/**
 * Maps directions seen from the camera onto the pixels of a frame, and back. Camera space is
 * right-handed: x to the right, y up, the camera looking along -z. Pixel coordinates are
 * continuous, x to the right and y downwards, with pixel (i, j) covering [i, i+1) x [j, j+1);
 * the frame centre is (width/2, height/2).
 *
 * <p>Three projections: {@link org.holdfast.render.projection.FlatProjection} (perspective),
 * {@link org.holdfast.render.projection.DomeProjection} (azimuthal equidistant fisheye, the
 * square dome master) and {@link org.holdfast.render.projection.PanoramaProjection}
 * (equirectangular, 2:1).
 */
package org.holdfast.render.projection;
