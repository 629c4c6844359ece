package dev.dwellwise.thermal;

import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;

/**
 * The exact series solution of transient conduction in a plane wall of half-thickness L (or of
 * thickness L with an insulated back face) in a fluid at T∞ with convection coefficient h, from a
 * uniform start (Incropera and DeWitt, <i>Fundamentals of Heat and Mass Transfer</i>, 6th ed.,
 * Eq. 5.42a–c [M]; REFERENCES.md section 1):
 * <pre>  θ*(x*, Fo) = Σ C_n exp(−ζ_n² Fo) cos(ζ_n x*),   ζ_n tan ζ_n = Bi,   C_n = 4 sin ζ_n / (2ζ_n + sin 2ζ_n)</pre>
 * θ* = (T − T∞)/(Ti − T∞), x* = x/L from the mid-plane (or insulated face), Fo = αt/L², Bi = hL/k.
 * Written here independently of the solver under test: roots by Commons Math's bracketing Brent
 * solver in ((n − 1)π, (n − 1)π + π/2), on ζ sin ζ − Bi cos ζ (the same roots, without the poles).
 */
final class PlaneWallSeries {

    /** Terms kept: at Fo ≥ 1e-3 the first dropped one is below exp(−(399π)² 1e-3) ≈ 1e-680; the ramp tail is ~1e-8. */
    static final int TERMS = 400;

    private final double[] zeta;
    private final double[] coefficient;

    PlaneWallSeries(double biot) {
        zeta = new double[TERMS];
        coefficient = new double[TERMS];
        for (int n = 1; n <= TERMS; n++) {
            zeta[n - 1] = eigenvalue(biot, n);
            coefficient[n - 1] = coefficient(zeta[n - 1]);
        }
    }

    /** ζ_n, the n-th positive root of ζ tan ζ = Bi (n ≥ 1). */
    static double eigenvalue(double biot, int n) {
        double low = (n - 1) * Math.PI;
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-15, 1e-15, 0, 5);
        return solver.solve(500, z -> z * Math.sin(z) - biot * Math.cos(z), low, low + Math.PI / 2);
    }

    static double coefficient(double zeta) {
        return 4 * Math.sin(zeta) / (2 * zeta + Math.sin(2 * zeta));
    }

    /** θ* at x* (0: mid-plane or insulated face; 1: exposed face) and Fo. */
    double theta(double xStar, double fourier) {
        double sum = 0;
        for (int n = 0; n < TERMS; n++) {
            sum += coefficient[n] * Math.exp(-zeta[n] * zeta[n] * fourier) * Math.cos(zeta[n] * xStar);
        }
        return sum;
    }

    /** The mean θ*, 1 − Q/Q0 = Σ C_n exp(−ζ_n² Fo) sin ζ_n / ζ_n. */
    double meanTheta(double fourier) {
        double sum = 0;
        for (int n = 0; n < TERMS; n++) {
            sum += coefficient[n] * Math.exp(-zeta[n] * zeta[n] * fourier) * Math.sin(zeta[n]) / zeta[n];
        }
        return sum;
    }

    /**
     * Response to a fluid temperature that ramps linearly from the wall's uniform start, T∞ = Ti + r t,
     * by Duhamel's superposition of the step response 1 − θ*: (T − Ti)/(r L²/α) =
     * Fo − Σ C_n cos(ζ_n x*)(1 − exp(−ζ_n² Fo))/ζ_n² (integrated here term by term, from memory [M]).
     */
    double rampResponse(double xStar, double fourier) {
        double sum = 0;
        for (int n = 0; n < TERMS; n++) {
            double z2 = zeta[n] * zeta[n];
            sum += coefficient[n] * Math.cos(zeta[n] * xStar) * -Math.expm1(-z2 * fourier) / z2;
        }
        return fourier - sum;
    }
}
