package org.holdfast.render;

/** What happened to a member of the group, as the overlays announce it. */
public enum FateKind {
    /** Two or more members became one. */
    MERGED,
    /** A member left the group for good. */
    ESCAPED,
    /** A member was torn away by phantom dark energy (w < -1) as the big rip nears. */
    RIPPED
}
