package dev.dwellwise.thermal;

/**
 * Reads the part's temperatures off the cell temperatures of a {@link SlabGrid}: exposed-face values
 * from the face balance, the value at a face without flux from the even parabola through the two
 * cells before it, the mid-plane of an asymmetric wall at its cell face, the capacity-weighted mean.
 *
 * <p>An exposed face has no heat capacity, so at the instant a stage starts its value takes the new
 * conditions across half the first cell at once: a step of q·dx₀/(2k) where the true surface is still
 * continuous. That is an O(dx) error confined to the first few dx₀²/α of the stage (for steel at the
 * default cells 0.004 K over microseconds, for a polymer about 1 K over a tenth of a second); means,
 * cores and everything later are unaffected.
 */
final class SlabReadout {

    private final SlabEquations equations;
    private final SlabGrid grid;

    SlabReadout(SlabEquations equations) {
        this.equations = equations;
        this.grid = equations.grid();
    }

    /** Temperatures at {@link SlabGrid#profilePositionsM()}, kelvin. */
    double[] profile(double t, double[] temps, SurfaceExposure exposure) {
        int n = grid.cells();
        boolean mirrored = grid.back() == SlabGrid.BackFace.MID_PLANE;
        double[] profile = new double[mirrored ? 2 * n + 3 : n + 2];
        System.arraycopy(temps, 0, profile, 1, n);
        profile[0] = equations.faceTemperature(0, t, temps[0], exposure);
        profile[n + 1] = grid.back() == SlabGrid.BackFace.EXPOSED
                ? equations.faceTemperature(n - 1, t, temps[n - 1], exposure)
                : noFluxFace(temps);
        if (mirrored) {
            for (int i = 0; i <= n + 1; i++) {
                profile[2 * n + 2 - i] = profile[i];
            }
        }
        return profile;
    }

    Observation observe(double t, double[] temps, SurfaceExposure exposure) {
        double[] profile = profile(t, temps, exposure);
        double coldest = profile[0];
        double hottest = profile[0];
        for (double k : profile) {
            coldest = Math.min(coldest, k);
            hottest = Math.max(hottest, k);
        }
        double core = grid.back() == SlabGrid.BackFace.EXPOSED ? midPlane(temps) : profile[grid.cells() + 1];
        return new Observation(mean(temps), profile[0], core, coldest, hottest);
    }

    /** Capacity-weighted mean: sum of C_i T_i over sum of C_i, C_i = rho_i c_i(T_i) dx_i. */
    double mean(double[] temps) {
        double weighted = 0;
        double capacity = 0;
        for (int i = 0; i < temps.length; i++) {
            double c = equations.capacity(i, temps[i]);
            weighted += c * temps[i];
            capacity += c;
        }
        return weighted / capacity;
    }

    /**
     * d(mean)/dt from the cell rates, K/s: with weights that vary with temperature,
     * sum of [C_i + C_i'(T_i − mean)] dT_i/dt over sum of C_i.
     */
    double meanRate(double[] temps, double[] rates) {
        double mean = mean(temps);
        double weighted = 0;
        double capacity = 0;
        for (int i = 0; i < temps.length; i++) {
            double c = equations.capacity(i, temps[i]);
            weighted += (c + equations.capacitySlope(i, temps[i]) * (temps[i] - mean)) * rates[i];
            capacity += c;
        }
        return weighted / capacity;
    }

    /**
     * The value at the back of the span where no heat crosses: the temperature there has zero slope,
     * T ≈ T_b + b d² with d the distance to the face, fitted through the last two cell centres
     * (error O(dx⁴) in the fit; the cell values themselves are second order). Across a material
     * interface the fit would not hold, and the last cell's value is taken.
     */
    private double noFluxFace(double[] temps) {
        int last = grid.cells() - 1;
        if (last == 0 || !grid.material(last).equals(grid.material(last - 1))) {
            return temps[last];
        }
        double near = grid.widthM(last) / 2;
        double far = grid.widthM(last) + grid.widthM(last - 1) / 2;
        double curvature = (temps[last - 1] - temps[last]) / (far * far - near * near);
        return temps[last] - curvature * near * near;
    }

    /** The temperature at the mid-plane face, where the flux through both half cells is the same. */
    private double midPlane(double[] temps) {
        int right = grid.midPlaneFace();
        int left = right - 1;
        double gLeft = 1 / equations.halfCellResistance(left, temps[left]);
        double gRight = 1 / equations.halfCellResistance(right, temps[right]);
        return (gLeft * temps[left] + gRight * temps[right]) / (gLeft + gRight);
    }
}
