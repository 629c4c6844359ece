package dev.dwellwise.thermal;

/**
 * Solves a tridiagonal system by the Thomas algorithm (Gaussian elimination without pivoting,
 * 8n flops), stable for the diagonally dominant matrices C − γh·dF/dT of the slab's Newton steps.
 * Keeps its own work array; the inputs are not changed.
 */
final class Tridiagonal {

    private final double[] work;

    Tridiagonal(int n) {
        this.work = new double[n];
    }

    /**
     * x with lower[i] x[i−1] + diagonal[i] x[i] + upper[i] x[i+1] = rhs[i] (lower[0] and upper[n−1]
     * unused). {@code x} may be {@code rhs}.
     */
    void solve(double[] lower, double[] diagonal, double[] upper, double[] rhs, double[] x) {
        int n = work.length;
        double pivot = diagonal[0];
        x[0] = rhs[0] / pivot;
        for (int i = 1; i < n; i++) {
            work[i] = upper[i - 1] / pivot;
            pivot = diagonal[i] - lower[i] * work[i];
            x[i] = (rhs[i] - lower[i] * x[i - 1]) / pivot;
        }
        for (int i = n - 2; i >= 0; i--) {
            x[i] -= work[i + 1] * x[i + 1];
        }
    }
}
