package dev.dwellwise.thermal;

import java.util.Arrays;

/**
 * A material property against temperature: one constant value, or a table interpolated linearly
 * between its points and held flat beyond its ends (the way handbook tables are used).
 */
public final class PropertyCurve {

    private final double[] kelvin;
    private final double[] values;
    /** Slope of each piece, per kelvin: {@link #at} is on the right-hand side of every solve. */
    private final double[] slopes;

    private PropertyCurve(double[] kelvin, double[] values) {
        this.kelvin = kelvin;
        this.values = values;
        this.slopes = new double[Math.max(0, kelvin.length - 1)];
        for (int i = 0; i < slopes.length; i++) {
            slopes[i] = (values[i + 1] - values[i]) / (kelvin[i + 1] - kelvin[i]);
        }
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
        int hi = 1;
        while (kelvin[hi] < temperatureK) { // handbook tables have a few columns: a scan beats a search
            hi++;
        }
        int lo = hi - 1;
        return values[lo] + (temperatureK - kelvin[lo]) * slopes[lo];
    }

    /**
     * Slope d(value)/dT, per kelvin: zero for a constant and beyond the table's ends; at a table
     * point, the slope of the piece above it. The slab's Newton iteration needs it for an exact Jacobian.
     */
    public double slopeAt(double temperatureK) {
        int n = values.length;
        if (n == 1 || !(temperatureK >= kelvin[0]) || temperatureK >= kelvin[n - 1]) {
            return 0; // NaN included: a failed step is caught by its error norm, not here
        }
        int i = Arrays.binarySearch(kelvin, temperatureK);
        return slopes[i >= 0 ? i : -i - 2];
    }

    /**
     * The curve w₀ f₀(T) + w₁ f₁(T) + …, exact: between the union of the curves' points every term
     * is linear, and beyond it every term is flat, so the sum is again such a curve.
     */
    public static PropertyCurve weightedSum(PropertyCurve[] curves, double[] weights) {
        // loops, not streams: this runs for every solve, and the stream pipelines cost more than the sum
        double[] points = unionOfPoints(curves);
        double[] sums = new double[points.length];
        for (int p = 0; p < points.length; p++) {
            for (int i = 0; i < curves.length; i++) {
                sums[p] += weights[i] * curves[i].at(points[p]);
            }
        }
        return new PropertyCurve(points, sums);
    }

    /** The sorted, distinct table temperatures of all the curves; {0} when every curve is a constant. */
    private static double[] unionOfPoints(PropertyCurve[] curves) {
        int total = 0;
        boolean allConstant = true;
        for (PropertyCurve curve : curves) {
            total += curve.kelvin.length;
            allConstant &= curve.isConstant();
        }
        if (allConstant) {
            return new double[] {0};
        }
        double[] all = new double[total];
        int at = 0;
        for (PropertyCurve curve : curves) {
            System.arraycopy(curve.kelvin, 0, all, at, curve.kelvin.length);
            at += curve.kelvin.length;
        }
        Arrays.sort(all);
        int distinct = 0;
        for (int i = 0; i < all.length; i++) {
            if (i == 0 || all[i] != all[distinct - 1]) {
                all[distinct++] = all[i];
            }
        }
        return Arrays.copyOf(all, distinct);
    }

    /**
     * The integral of the property over temperature from {@code fromK} to {@code toK}, exact for the
     * piecewise-linear curve (trapezoids between table points): for a specific heat, the enthalpy
     * change per kilogram.
     */
    public double integral(double fromK, double toK) {
        if (values.length == 1) {
            return values[0] * (toK - fromK);
        }
        if (fromK > toK) {
            return -integral(toK, fromK);
        }
        int i = Arrays.binarySearch(kelvin, fromK);
        int next = i >= 0 ? i + 1 : -i - 1;
        double sum = 0;
        double lo = fromK;
        double atLo = at(fromK);
        for (; next < kelvin.length && kelvin[next] < toK; next++) {
            sum += 0.5 * (kelvin[next] - lo) * (atLo + values[next]);
            lo = kelvin[next];
            atLo = values[next];
        }
        return sum + 0.5 * (toK - lo) * (atLo + at(toK));
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
