package dev.dwellwise.thermal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Numbers in the sentences of an answer (reasons, check details, chart labels): locale-independent
 * and deterministic, shared by every layer that writes such text.
 *
 * <p>Why not {@code String.format}: it parses its pattern on every call, and an answer carries a
 * dozen numbers; on the simulation path that parsing cost more than the lumped solve itself.
 */
public final class DecimalText {

    /** The powers of ten that are exact doubles: 10^22 is the last (5^23 needs more than 53 bits). */
    private static final double[] SCALE = {1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
    /** The largest n whose 10^n {@link #powerOfTen} gives exactly. */
    public static final int MAX_EXACT_POWER = SCALE.length - 1;

    private DecimalText() {
    }

    /**
     * 10^n exactly, for 0 &le; n &le; {@link #MAX_EXACT_POWER}: what the roundings here and in the report
     * multiply by, so that a value is scaled with a single IEEE rounding.
     */
    public static double powerOfTen(int n) {
        return SCALE[n];
    }

    /**
     * {@code decimals} places, half away from zero, like {@code %.Nf} (0 to {@link #MAX_EXACT_POWER}
     * places); "0.0" rather than "-0.0" for a negative value that rounds to zero.
     */
    public static String fixed(double value, int decimals) {
        double scale = SCALE[decimals];
        if (!Double.isFinite(value) || Math.abs(value) * scale >= 1e15) {
            return Double.isFinite(value)
                    ? BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).toPlainString()
                    : Double.toString(value);
        }
        double scaled = Math.abs(value) * scale;
        if (Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) {
            // near a tie the binary product may round the other way than the decimal form does
            return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
        }
        long units = Math.round(scaled);
        String digits = Long.toString(units);
        StringBuilder out = new StringBuilder(digits.length() + 3);
        if (value < 0 && units != 0) {
            out.append('-');
        }
        if (decimals == 0) {
            return out.append(digits).toString();
        }
        int whole = digits.length() - decimals;
        if (whole <= 0) {
            out.append("0.");
            out.append("0".repeat(-whole));
            return out.append(digits).toString();
        }
        return out.append(digits, 0, whole).append('.').append(digits, whole, digits.length()).toString();
    }

    /**
     * {@code digits} significant digits like {@code %.Ng}: plain between 1e-4 and 10^digits,
     * otherwise in scientific notation ("1.250e-05").
     */
    public static String significant(double value, int digits) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0) {
            return fixed(0, digits - 1);
        }
        double magnitude = Math.abs(value);
        if (magnitude >= 1e-4 && digits <= 7 && magnitude < SCALE[digits - 1]) {
            // plain whatever the rounding carries into: fixed places by IEEE arithmetic, as fixed() does
            // them (BigDecimal's decimal expansion cost more than the rest of a model-choice reason)
            int decimals = digits - 1 - (int) Math.floor(Math.log10(magnitude));
            double scaled = magnitude * SCALE[decimals];
            if (Math.abs(scaled - Math.floor(scaled) - 0.5) >= 1e-6) {
                // 9.9996 to 4 digits is 10.00: the carry into the next power of ten takes a place away
                return fixed(value, Math.round(scaled) >= SCALE[digits] ? decimals - 1 : decimals);
            }
        }
        // from the shortest decimal form, as the formatter rounds: 1.0005 gives 1.001
        BigDecimal rounded = BigDecimal.valueOf(value).round(new MathContext(digits, RoundingMode.HALF_UP));
        int exponent = rounded.precision() - rounded.scale() - 1;
        if (exponent >= -4 && exponent < digits) {
            return rounded.setScale(digits - 1 - exponent, RoundingMode.HALF_UP).toPlainString();
        }
        String mantissa = rounded.movePointLeft(exponent).setScale(digits - 1, RoundingMode.HALF_UP).toPlainString();
        int size = Math.abs(exponent);
        return mantissa + (exponent < 0 ? "e-" : "e+") + (size < 10 ? "0" : "") + size;
    }

    /** A whole number without a decimal point, anything else as Java writes a double. */
    public static String trimmed(double value) {
        return value == Math.rint(value) && Math.abs(value) < 9e18 ? Long.toString((long) value) : Double.toString(value);
    }
}
