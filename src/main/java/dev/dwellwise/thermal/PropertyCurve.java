package dev.dwellwise.thermal;

import java.util.Arrays;

/**
 * A material property against temperature: one constant value, or a table interpolated linearly
 * between its points and held flat beyond its ends (the way handbook tables are used).
 */
public final class PropertyCurve {

    private final double[] kelvin;
    private final double[] values;

    private PropertyCurve(double[] kelvin, double[] values) {
        this.kelvin = kelvin;
        this.values = values;
    }

    public static PropertyCurve constant(double value) {
        return new PropertyCurve(new double[] {0}, new double[] {value});
    }

    /** A table; temperatures in kelvin, strictly increasing (the job validator checks this). */
    public static PropertyCurve table(double[] kelvin, double[] values) {
        if (kelvin.length != values.length || kelvin.length == 0) {
            throw new IllegalArgumentException("a property table needs as many values as temperatures");
        }
        for (int i = 1; i < kelvin.length; i++) {
            if (!(kelvin[i] > kelvin[i - 1])) {
                throw new IllegalArgumentException("property table temperatures must increase");
            }
        }
        return new PropertyCurve(kelvin.clone(), values.clone());
    }

    public boolean isConstant() {
        return values.length == 1;
    }

    public double at(double temperatureK) {
        int n = values.length;
        if (n == 1 || temperatureK <= kelvin[0]) {
            return values[0];
        }
        if (temperatureK >= kelvin[n - 1]) {
            return values[n - 1];
        }
        int i = Arrays.binarySearch(kelvin, temperatureK);
        if (i >= 0) {
            return values[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double f = (temperatureK - kelvin[lo]) / (kelvin[hi] - kelvin[lo]);
        return values[lo] + f * (values[hi] - values[lo]);
    }

    /** Smallest value over a temperature range (the conservative conductivity for a Biot number). */
    public double minimumOver(double lowK, double highK) {
        double min = Math.min(at(lowK), at(highK));
        for (int i = 0; i < kelvin.length && values.length > 1; i++) {
            if (kelvin[i] > lowK && kelvin[i] < highK) {
                min = Math.min(min, values[i]);
            }
        }
        return min;
    }

    /** Temperatures of the table, kelvin (one zero for a constant). */
    public double[] temperaturesK() {
        return kelvin.clone();
    }

    public double[] values() {
        return values.clone();
    }
}
