/**
 * Reading scenario files: TOML parsed by tomlj, read through a small schema layer that names
 * file, line and key in every error, with command-line overrides by dotted key. Each section
 * (cosmology, run, galaxies, ...) has its own reader next to the concept it builds.
 */
package org.holdfast.scenario;
