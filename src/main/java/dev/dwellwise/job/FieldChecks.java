package dev.dwellwise.job;

import dev.dwellwise.thermal.DecimalText;
import java.util.List;

/**
 * The small checks the validators share. Each adds a {@link FieldError} to the list it was given
 * when the value fails, and returns whether it passed, so a caller goes on only with sound values.
 */
abstract class FieldChecks {

    /** Below this the value is at or below absolute zero, °C. */
    static final double ABSOLUTE_ZERO_C = -273.15;
    /** Above this no oven or part temperature makes sense, °C (steel melts near 1500 °C). */
    static final double MAX_TEMPERATURE_C = 2000;

    final List<FieldError> errors;

    FieldChecks(List<FieldError> errors) {
        this.errors = errors;
    }

    boolean required(Object value, String field) {
        if (value == null) {
            add(field, "is required");
            return false;
        }
        return true;
    }

    boolean finite(double value, String field) {
        if (!Double.isFinite(value)) {
            add(field, "must be a finite number");
            return false;
        }
        return true;
    }

    boolean temperature(double c, String field) {
        if (!finite(c, field)) {
            return false;
        }
        if (c <= ABSOLUTE_ZERO_C) {
            add(field, "must be above absolute zero (-273.15 °C)");
            return false;
        }
        if (c > MAX_TEMPERATURE_C) {
            add(field, "must be at most " + (int) MAX_TEMPERATURE_C + " °C");
            return false;
        }
        return true;
    }

    boolean range(double value, double low, double high, String field) {
        if (!finite(value, field)) {
            return false;
        }
        if (!(value >= low && value <= high)) {
            add(field, "must be from " + DecimalText.trimmed(low) + " to " + DecimalText.trimmed(high));
            return false;
        }
        return true;
    }

    void positive(Double value, String field, boolean isRequired) {
        if (value == null) {
            if (isRequired) {
                add(field, "is required");
            }
            return;
        }
        if (finite(value, field) && !(value > 0)) {
            add(field, "must be above 0");
        }
    }


    void add(String field, String message) {
        errors.add(new FieldError(field, message));
    }
}
