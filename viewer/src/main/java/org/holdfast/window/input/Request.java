package org.holdfast.window.input;

/** What the window must do after an event, beyond taking the new view state. */
public enum Request {
    /** Nothing more. */
    NONE,
    /** Save a PNG of the frame as shown. */
    SCREENSHOT,
    /** Save a PNG at the large screenshot size, drawn afresh by the frame source. */
    SCREENSHOT_LARGE,
    /** Fill the screen, or go back to a window. */
    WHOLE_SCREEN,
    /** Close the window. */
    QUIT
}
