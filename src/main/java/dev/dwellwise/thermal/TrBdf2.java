package dev.dwellwise.thermal;

/**
 * One step of TR-BDF2 (Bank, Coughran, Fichtner, Grosse, Rose and Smith, "Transient simulation of
 * silicon devices and circuits", IEEE Trans. CAD 4 (1985) 436–451) on the conservation form
 * dE(T)/dt = F(t, T) of {@link SlabEquations}: a trapezoidal stage to t + γh, then a second-order
 * backward difference through t, t + γh and t + h, γ = 2 − √2. Written as a stiffly accurate
 * ESDIRK with a = [[0], [d, d], [w, w, d]], d = γ/2, w = √2/4:
 * <pre>  E(Y₂) − E(y) = h d (F₁ + F₂)              F₁ = F(t, y), F₂ = F(t + γh, Y₂)
 *  E(Y₃) − E(y) = h (w F₁ + w F₂ + d F₃)      y(t + h) = Y₃</pre>
 * It is L-stable and second order; the energy change of a step is exactly the quadrature of the
 * face fluxes (interior fluxes cancel), so the scheme conserves heat whatever the step. Local
 * error: the difference to the third-order companion weights [(1 − w)/3, (3w + 1)/3, d/3]
 * (Hosea and Shampine, "Analysis and implementation of TR-BDF2", Appl. Numer. Math. 20 (1996) 21–37),
 * filtered through (C − d h J)⁻¹ so that stiff components do not swamp it (the device of Hairer and
 * Wanner, <i>Solving Ordinary Differential Equations II</i>, Sect. IV.8). Each stage is solved by
 * Newton's method with the exact tridiagonal Jacobian. Cost of a step: typically 4 to 6
 * tridiagonal solves of 8n flops plus as many flux evaluations (one face solve each).
 */
final class TrBdf2 {

    static final double GAMMA = 2 - Math.sqrt(2);
    private static final double D = GAMMA / 2;
    private static final double W = Math.sqrt(2) / 4;
    /** Error weights: third-order companion minus the method's own weights [w, w, d]. */
    private static final double E1 = (1 - 4 * W) / 3;
    private static final double E2 = 1.0 / 3;
    private static final double E3 = -2 * D / 3;

    /** Newton stops when its update is this fraction of the error tolerance: far below the local error. */
    private static final double NEWTON_FRACTION = 1e-3;
    private static final int NEWTON_ITERATIONS = 8;

    private final SlabEquations equations;
    private final double relativeTolerance;
    private final SlabEquations.Linearisation linearisation;
    private final Tridiagonal solver;
    private final double[] weight;
    private final double[] residual;
    private final double[] delta;
    private final double[] lower;
    private final double[] diagonal;
    private final double[] upper;
    private long solves;

    TrBdf2(SlabEquations equations, double relativeTolerance) {
        this.equations = equations;
        this.relativeTolerance = relativeTolerance;
        int n = equations.cells();
        this.linearisation = new SlabEquations.Linearisation(n);
        this.solver = new Tridiagonal(n);
        this.weight = new double[n];
        this.residual = new double[n];
        this.delta = new double[n];
        this.lower = new double[n];
        this.diagonal = new double[n];
        this.upper = new double[n];
    }

    /** Tridiagonal solves so far. */
    long solves() {
        return solves;
    }

    /** F(t, y) and dT/dt = F / C there: the state's derivative, for a step's start. */
    Derivative derivative(double t, double[] y, SurfaceExposure exposure) {
        equations.evaluate(t, y, exposure, linearisation);
        return Derivative.of(linearisation);
    }

    /**
     * Attempts the step from (t, y), judging its local error in the weights rtol · T (kelvin, so
     * relative error control alone is meaningful) with flux F₁ = {@code start.flux()}; returns null when Newton
     * fails to converge (the caller shrinks the step).
     */
    Step attempt(double t, double h, double[] y, Derivative start, SurfaceExposure exposure) {
        int n = y.length;
        for (int i = 0; i < n; i++) {
            weight[i] = relativeTolerance * y[i]; // kelvin: positive, far from zero
        }
        double[] f1 = start.flux();
        double[] stage = y.clone();
        double[] known = new double[n];
        for (int i = 0; i < n; i++) {
            known[i] = h * D * f1[i];
        }
        if (!solveStage(t + GAMMA * h, h, y, known, stage, exposure)) {
            return null;
        }
        double[] f2 = linearisation.flux.clone();
        double[] end = new double[n];
        for (int i = 0; i < n; i++) {
            known[i] = h * W * (f1[i] + f2[i]);
            end[i] = y[i] + (stage[i] - y[i]) / GAMMA;
        }
        if (!solveStage(t + h, h, y, known, end, exposure)) {
            return null;
        }
        Derivative derivative = Derivative.of(linearisation);
        double[] f3 = derivative.flux();
        double[] error = new double[n];
        for (int i = 0; i < n; i++) {
            error[i] = h * (E1 * f1[i] + E2 * f2[i] + E3 * f3[i]);
        }
        buildMatrix(h);
        solver.solve(lower, diagonal, upper, error, error);
        solves++;
        double norm = 0;
        for (int i = 0; i < n; i++) {
            double w = relativeTolerance * Math.max(y[i], end[i]);
            norm = Math.max(norm, Math.abs(error[i]) / w);
        }
        return new Step(end, derivative, norm);
    }

    /**
     * Newton on E(Y) − E(y) − h d F(t_s, Y) − known = 0, from the guess in {@code stage}; on success
     * {@code stage} holds the solution and the linearisation is the one at it.
     */
    private boolean solveStage(double ts, double h, double[] y, double[] known, double[] stage,
                               SurfaceExposure exposure) {
        int n = y.length;
        double previous = Double.POSITIVE_INFINITY;
        for (int iteration = 0; iteration < NEWTON_ITERATIONS; iteration++) {
            equations.evaluate(ts, stage, exposure, linearisation);
            for (int i = 0; i < n; i++) {
                residual[i] = known[i] + h * D * linearisation.flux[i] - equations.storedHeat(i, y[i], stage[i]);
            }
            buildMatrix(h);
            solver.solve(lower, diagonal, upper, residual, delta);
            solves++;
            double norm = 0;
            for (int i = 0; i < n; i++) {
                stage[i] += delta[i];
                norm = Math.max(norm, Math.abs(delta[i]) / weight[i]);
                if (!(stage[i] > 0)) {
                    return false; // no kelvin temperature: the step was far too long
                }
            }
            if (norm <= NEWTON_FRACTION) {
                equations.evaluate(ts, stage, exposure, linearisation);
                return true;
            }
            if (norm >= previous) {
                return false; // not contracting
            }
            previous = norm;
        }
        return false;
    }

    /** The Newton matrix C − h d J from the current linearisation. */
    private void buildMatrix(double h) {
        double hd = h * D;
        for (int i = 0; i < lower.length; i++) {
            lower[i] = -hd * linearisation.lower[i];
            diagonal[i] = linearisation.capacity[i] - hd * linearisation.diagonal[i];
            upper[i] = -hd * linearisation.upper[i];
        }
    }

    /**
     * The cell fluxes F (W/m²) at a state and the temperature rates F/C (K/s) they give. Like
     * {@link Step}, it owns its arrays and nobody writes to them (not copied: this is the inner loop).
     */
    record Derivative(double[] flux, double[] rate) {

        static Derivative of(SlabEquations.Linearisation at) {
            double[] flux = at.flux.clone();
            double[] rate = new double[flux.length];
            for (int i = 0; i < flux.length; i++) {
                rate[i] = flux[i] / at.capacity[i];
            }
            return new Derivative(flux, rate);
        }
    }

    /**
     * An attempted step: the end state (kelvin), its derivative, and the weighted local error
     * (accept when at most 1).
     */
    record Step(double[] end, Derivative derivative, double errorNorm) {
    }
}
