/**
 * A galaxy group as the user describes it: members with their halos and tracers, and the flow
 * around them. Plain data, read from scenarios and built into a simulation by {@code run}.
 */
package org.holdfast.group;
