/**
 * Members from observations: a galaxy given by where it is seen on the sky, how far it is and
 * how fast it moves along the line of sight (and, if measured, across it), turned into a
 * Cartesian state relative to the centre of the home galaxy the observer lives in.
 *
 * <p>The chain: sky position (ICRS right ascension and declination, or Galactic longitude and
 * latitude) and distance give a heliocentric vector; {@link org.holdfast.observe.GalacticRotation}
 * (the Hipparcos ICRS-to-Galactic rotation, ESA 1997) turns it into Galactic axes;
 * {@link org.holdfast.observe.HomeFrame} moves the origin from the observer to the home centre
 * and adds the observer's motion; {@link org.holdfast.observe.GroupFrame} finally moves a whole
 * group to its centre-of-mass frame.
 *
 * <p>Home frame (the convention every state from this package uses): origin at the home
 * galaxy's centre; x from the observer's side toward the centre, y toward Galactic longitude
 * 90 degrees (the sense of the home disc's rotation), z toward the north Galactic pole, so
 * right-handed. The centre is taken to lie exactly at l = 0, b = 0 as seen by the observer, at
 * the distance {@code distance_to_centre_kpc}; the frame is tilted about y so that the
 * observer stands {@code height_kpc} above the midplane, at
 * (-sqrt(R0^2 - h^2), 0, h). The observer's velocity (U, V, W) is given in these axes: U toward
 * the centre, V along the rotation, W toward the north pole.
 */
package org.holdfast.observe;
