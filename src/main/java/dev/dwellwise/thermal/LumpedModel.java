package dev.dwellwise.thermal;

/**
 * The lumped-capacitance back end: the part at one uniform temperature T, valid while the Biot
 * number is small (Bi &lt; 0.1). Energy balance per unit exposed area:
 * <pre>  C(T) dT/dt = faces · [ h (T_air(t) − T) + eps sigma (T_sur(t)⁴ − T⁴) ]</pre>
 * with C(T) = sum over layers of rho c(T) L (J/(m²·K)), integrated by Commons Math's
 * Dormand–Prince 8(5,3) with relative tolerance {@link #RELATIVE_TOLERANCE}.
 */
public final class LumpedModel implements ThermalModel {

    /** Relative tolerance of the error control: leaves about 1e-6 K on a 500 K history. */
    public static final double RELATIVE_TOLERANCE = 1e-9;

    /** Absolute tolerance, kelvin. */
    public static final double ABSOLUTE_TOLERANCE = 1e-7;

    @Override
    public String name() {
        return "lumped";
    }

    @Override
    public String method() {
        return "lumped capacitance; Dormand-Prince 8(5,3) adaptive integration (Apache Commons Math 3.6.1); "
                + "events by Brent root finding on the dense output";
    }

    @Override
    public double tolerance() {
        return RELATIVE_TOLERANCE;
    }

    @Override
    public Stepper newStepper(ThermalPart part, ComputeBudget budget) {
        return new LumpedStepper(part, budget);
    }
}
