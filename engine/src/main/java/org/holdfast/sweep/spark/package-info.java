/**
 * The Spark engine of a sweep: each Spark task makes one run. Loaded by name only when
 * {@code --engine spark} is chosen, so that the engine jar works without Spark on its class
 * path; Spark itself is supplied by the cluster ({@code spark-submit}).
 */
package org.holdfast.sweep.spark;
