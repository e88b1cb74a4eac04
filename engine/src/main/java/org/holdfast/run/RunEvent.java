package org.holdfast.run;

import java.util.List;

/**
 * Something that happened to members during a run, at a time.
 *
 * @param tGyr when, Gyr from today
 * @param kind "merged", "escaped", "ripped", ...
 * @param members the members involved; for a merger the survivor's name first
 */
public record RunEvent(double tGyr, String kind, List<String> members) {
}
