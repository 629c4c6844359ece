package dev.dwellwise.thermal;

/**
 * The lumped-capacitance back end: the part at one uniform temperature T, valid while the Biot
 * number is small (Bi &lt; 0.1). Energy balance per unit exposed area:
 * <pre>  C(T) dT/dt = faces · [ h (T_air(t) − T) + eps sigma (T_sur(t)⁴ − T⁴) ]</pre>
 * with C(T) = sum over layers of rho c(T) L (J/(m²·K)), integrated by {@link ScalarDormandPrince}
 * (Dormand–Prince 5(4) with its continuous extension) with relative tolerance {@link #RELATIVE_TOLERANCE}.
 */
public final class LumpedModel implements ThermalModel {

    /**
     * Relative tolerance of the error control. The closed-form tests see errors below 1e-6 K and
     * 1e-6 s; with a tabulated heat capacity and radiation the final temperature is off by about
     * 3e-5 K, some three hundred times inside the 0.01 K target. An event time is ill-conditioned
     * only for a threshold within a millikelvin of the steady temperature (where the part creeps).
     * 1e-9 gave a deeper margin for half again the steps.
     */
    public static final double RELATIVE_TOLERANCE = 1e-8;

    /** Absolute tolerance, kelvin. */
    public static final double ABSOLUTE_TOLERANCE = 1e-7;

    /**
     * The error scale of one step at temperature {@code kelvin}: absolute plus relative tolerance
     * times T, about 5e-6 K at oven temperatures, two thousand times finer than the 0.01 K accuracy
     * target. Closer than this to its steady temperature a part (lumped or slab) is taken as settled
     * ({@link SettledSegment}); a finer band could be missed for ever by a stiff part whose steps
     * wander within that scale at the explicit method's stability limit.
     */
    static double settleBandK(double kelvin) {
        return ABSOLUTE_TOLERANCE + RELATIVE_TOLERANCE * Math.abs(kelvin);
    }

    @Override
    public String name() {
        return "lumped";
    }

    @Override
    public String method() {
        return "lumped capacitance; Dormand-Prince 5(4) adaptive integration with its continuous extension; "
                + "events by Brent root finding on the dense output";
    }

    @Override
    public double tolerance() {
        return RELATIVE_TOLERANCE;
    }

    @Override
    public Stepper newStepper(ThermalPart part, ComputeBudget budget, Deadline deadline) {
        return new LumpedStepper(part, budget, deadline);
    }
}
