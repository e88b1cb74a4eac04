/**
 * The renderer's benchmarks ({@code holdfast bench --only render}). Speed targets live here,
 * never in unit tests.
 */
package org.holdfast.render.bench;
