package dev.dwellwise.report;

/**
 * One check of the history against a limit or a condition.
 *
 * @param name    {@code model-validity}, {@code stage-end}, {@code peak-temperature}, ...
 * @param status  {@code pass}, {@code fail} or {@code warn}
 * @param value   the figure that decided it (unit as in the detail)
 * @param limit   the limit it was compared with
 * @param detail  a sentence an operator can act on
 * @param stage   the stage it concerns ({@code stage-end} only)
 */
public record CheckResult(String name, String status, Double value, Double limit, String detail, String stage) {

    public static final String PASS = "pass";
    public static final String FAIL = "fail";
    public static final String WARN = "warn";

    public boolean failed() {
        return FAIL.equals(status);
    }
}
