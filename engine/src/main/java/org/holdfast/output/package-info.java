/**
 * Writers of a run folder: HDF5 snapshots, the galaxies' tracks as CSV, the JSON summary and
 * the resolved scenario for provenance. Writers that follow the run are observers of its loop.
 */
package org.holdfast.output;
