package org.holdfast.window.input;

/** What a key asks the view to do. */
public enum Action {
    PLAY_PAUSE("play or pause the clock"),
    FASTER("clock runs twice as fast"),
    SLOWER("clock runs half as fast"),
    REVERSE("clock runs the other way"),
    SCRUB_LATER("step the clock later (1/100 of the run)"),
    SCRUB_EARLIER("step the clock earlier (1/100 of the run)"),
    NUDGE_LATER("nudge the clock later (1/1000 of the run)"),
    NUDGE_EARLIER("nudge the clock earlier (1/1000 of the run)"),
    NEXT_EVENT("jump to the next fate event in the clock's direction"),
    PREVIOUS_EVENT("jump back to the last fate event passed"),
    TO_START("jump to the start of the run"),
    TO_END("jump to the end of the run"),
    CHOOSE_NEXT("choose the next galaxy"),
    CHOOSE_PREVIOUS("choose the previous galaxy"),
    FOLLOW_CHOSEN("centre on the chosen galaxy and ride along with it"),
    CENTRE_GROUP("centre on the whole group (stop riding along)"),
    SWITCH_DOME("switch between the flat view and the dome preview"),
    CLOSER("move the camera closer"),
    FARTHER("move the camera farther"),
    NARROWER("narrower field of view"),
    WIDER("wider field of view"),
    SHOW_TRAILS("trails on or off"),
    SHOW_NAMES("names on or off"),
    SHOW_STARS("stars on or off"),
    SHOW_TRACERS("flow tracers on or off"),
    SHOW_CLOCK("clock and scale factor on or off"),
    SHOW_EVENTS("fate-event notes on or off"),
    SHOW_HELP("this list of keys on or off"),
    WHOLE_SCREEN("fill the screen, or go back to a window"),
    SCREENSHOT("save a PNG at the window's size"),
    SCREENSHOT_LARGE("save a PNG at the large screenshot size"),
    QUIT("close the window");

    private final String description;

    Action(String description) {
        this.description = description;
    }

    /** One line for the key list. */
    public String description() {
        return description;
    }
}
