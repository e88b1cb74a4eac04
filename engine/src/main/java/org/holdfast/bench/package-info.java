/**
 * Benchmarks of the hot paths, run by {@code holdfast bench}. Speed targets live here, never in
 * unit tests.
 */
package org.holdfast.bench;
