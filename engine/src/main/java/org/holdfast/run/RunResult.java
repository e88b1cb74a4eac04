package org.holdfast.run;

/**
 * What a finished run reports.
 *
 * @param reason why it stopped
 * @param endGyr the time reached
 * @param steps steps taken
 * @param wallSeconds wall-clock time of the stepping loop
 * @param maxEnergyResidual the largest relative energy-budget residual seen (at every
 *     snapshot, and after every step for groups of up to 64 bodies)
 */
public record RunResult(StopReason reason, double endGyr, long steps, double wallSeconds, double maxEnergyResidual) {
}
