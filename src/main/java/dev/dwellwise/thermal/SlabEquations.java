package dev.dwellwise.thermal;

/**
 * The semi-discrete heat equation of a {@link SlabGrid}, in conservation form: for every cell i,
 * <pre>  d E_i(T_i)/dt = φ_{i−1/2} − φ_{i+1/2},    E_i(T) = ρ_i dx_i ∫ c_i(T) dT      (W/m², J/m²)</pre>
 * with the conduction flux between neighbouring cell centres through the two half cells in series
 * (the harmonic mean of their conductivities; Patankar, <i>Numerical Heat Transfer and Fluid Flow</i>,
 * 1980, Sect. 4.2-3),
 * <pre>  φ_{i+1/2} = (T_i − T_{i+1}) / (dx_i / 2k_i(T_i) + dx_{i+1} / 2k_{i+1}(T_{i+1})),</pre>
 * and at an exposed face the convection and radiation flux q(Ts) at the face temperature Ts that
 * passes through the half cell, q(Ts) = (2k/dx)(Ts − T_cell) (see
 * {@link SurfaceExposure#faceTemperature}). An insulated back face, or the mid-plane of a
 * symmetric wall, carries no flux.
 *
 * <p>{@link #evaluate} returns the fluxes F(T) and their exact Jacobian dF/dT (tridiagonal), the
 * temperature-dependent conductivities and the face solve included, for Newton's method.
 */
final class SlabEquations {

    private final SlabGrid grid;
    private final double[] rhoDx;
    private final double[] resistance;
    private final double[] resistanceSlope;

    SlabEquations(SlabGrid grid) {
        this.grid = grid;
        int n = grid.cells();
        this.rhoDx = new double[n];
        for (int i = 0; i < n; i++) {
            rhoDx[i] = grid.material(i).densityKgPerM3() * grid.widthM(i);
        }
        this.resistance = new double[n];
        this.resistanceSlope = new double[n];
    }

    SlabGrid grid() {
        return grid;
    }

    int cells() {
        return grid.cells();
    }

    /** Heat stored in cell i between two of its temperatures, J/m²: E_i(toK) − E_i(fromK). */
    double storedHeat(int cell, double fromK, double toK) {
        return rhoDx[cell] * grid.material(cell).specificHeat().integral(fromK, toK);
    }

    /** Heat capacity of cell i per unit face area at a temperature, dE_i/dT, J/(m²·K). */
    double capacity(int cell, double temperatureK) {
        return rhoDx[cell] * grid.material(cell).specificHeat().at(temperatureK);
    }

    /** d(capacity)/dT of cell i, J/(m²·K²). */
    double capacitySlope(int cell, double temperatureK) {
        return rhoDx[cell] * grid.material(cell).specificHeat().slopeAt(temperatureK);
    }

    /** The half-cell conduction resistance dx/(2k) of cell i at a temperature, m²K/W. */
    double halfCellResistance(int cell, double temperatureK) {
        return grid.widthM(cell) / (2 * grid.material(cell).conductivity().at(temperatureK));
    }

    /** Fluxes, Jacobian and capacities at time t and cell temperatures {@code temps}, into {@code out}. */
    void evaluate(double t, double[] temps, SurfaceExposure exposure, Linearisation out) {
        int n = grid.cells();
        for (int i = 0; i < n; i++) {
            PropertyCurve k = grid.material(i).conductivity();
            double conductivity = k.at(temps[i]);
            resistance[i] = grid.widthM(i) / (2 * conductivity);
            resistanceSlope[i] = -grid.widthM(i) * k.slopeAt(temps[i]) / (2 * conductivity * conductivity);
            out.flux[i] = 0;
            out.lower[i] = 0;
            out.diagonal[i] = 0;
            out.upper[i] = 0;
            out.capacity[i] = capacity(i, temps[i]);
        }
        for (int i = 0; i + 1 < n; i++) {
            double g = 1 / (resistance[i] + resistance[i + 1]);
            double difference = temps[i] - temps[i + 1];
            double phi = g * difference;
            double dPhiLeft = g - difference * g * g * resistanceSlope[i];
            double dPhiRight = -g - difference * g * g * resistanceSlope[i + 1];
            out.flux[i] -= phi;
            out.flux[i + 1] += phi;
            out.diagonal[i] -= dPhiLeft;
            out.upper[i] -= dPhiRight;
            out.lower[i + 1] += dPhiLeft;
            out.diagonal[i + 1] += dPhiRight;
        }
        exposedFace(0, t, temps, exposure, out);
        if (grid.back() == SlabGrid.BackFace.EXPOSED) {
            exposedFace(n - 1, t, temps, exposure, out);
        }
    }

    /**
     * Adds the face flux F(T_cell) = q(Ts(T_cell)) and its derivative. From q(Ts) = g (Ts − T_cell)
     * with g = 1/R(T_cell): dTs/dT_cell = (g − g' (Ts − T_cell)) / (g − q'(Ts)), dF/dT_cell = q'(Ts) dTs/dT_cell.
     */
    private void exposedFace(int cell, double t, double[] temps, SurfaceExposure exposure, Linearisation out) {
        double g = 1 / resistance[cell];
        double gSlope = -resistanceSlope[cell] * g * g;
        double face = exposure.faceTemperature(t, temps[cell], g);
        double qSlope = exposure.fluxSlope(face);
        out.flux[cell] += exposure.flux(t, face);
        out.diagonal[cell] += qSlope * (g - gSlope * (face - temps[cell])) / (g - qSlope);
    }

    /** Face temperature at the front (cell 0) or back (last cell) of the wall. */
    double faceTemperature(int cell, double t, double temperatureK, SurfaceExposure exposure) {
        return exposure.faceTemperature(t, temperatureK, 1 / halfCellResistance(cell, temperatureK));
    }

    /**
     * Fluxes F (W/m²), Jacobian dF/dT as its three diagonals (row i: lower[i] multiplies T_{i−1},
     * upper[i] multiplies T_{i+1}), and the cell capacities dE/dT (J/(m²·K)). A work area, reused.
     */
    static final class Linearisation {
        final double[] flux;
        final double[] lower;
        final double[] diagonal;
        final double[] upper;
        final double[] capacity;

        Linearisation(int cells) {
            flux = new double[cells];
            lower = new double[cells];
            diagonal = new double[cells];
            upper = new double[cells];
            capacity = new double[cells];
        }
    }
}
