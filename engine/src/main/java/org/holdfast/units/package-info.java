/**
 * Constants and unit conversions, each with its published source. Internal units: kpc, Gyr,
 * Msun; conversions to km/s, km/s/Mpc and SI happen only where values leave or enter the engine.
 */
package org.holdfast.units;
