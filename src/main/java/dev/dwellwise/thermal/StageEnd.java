package dev.dwellwise.thermal;

/** How a stage ended. */
public enum StageEnd {
    /** A fixed-duration stage ran its time. */
    DURATION("duration"),
    /** The temperature condition was met. */
    REACHED("reached"),
    /** The hold was completed. */
    HOLD_COMPLETE("hold-complete"),
    /** The stage hit its maxSeconds bound without its condition being met. */
    MAX_SECONDS("max-seconds");

    private final String wireName;

    StageEnd(String wireName) {
        this.wireName = wireName;
    }

    public String wireName() {
        return wireName;
    }
}
