package dev.dwellwise.thermal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

/** The Thomas algorithm against Commons Math's dense LU solve. */
class SlabTridiagonalTest {

    @Test
    void solvesADiagonallyDominantSystemAsDenseLuDoes() {
        int n = 37;
        Random random = new Random(20240611);
        double[] lower = new double[n];
        double[] diagonal = new double[n];
        double[] upper = new double[n];
        double[] rhs = new double[n];
        Array2DRowRealMatrix dense = new Array2DRowRealMatrix(n, n);
        for (int i = 0; i < n; i++) {
            lower[i] = i > 0 ? -random.nextDouble() : 0;
            upper[i] = i < n - 1 ? -random.nextDouble() : 0;
            diagonal[i] = 2.5 + random.nextDouble() * 1e3; // dominant, widely scaled like C - d h J
            rhs[i] = random.nextGaussian();
            dense.setEntry(i, i, diagonal[i]);
            if (i > 0) {
                dense.setEntry(i, i - 1, lower[i]);
            }
            if (i < n - 1) {
                dense.setEntry(i, i + 1, upper[i]);
            }
        }
        double[] expected = new LUDecomposition(dense).getSolver().solve(new ArrayRealVector(rhs)).toArray();
        double[] x = new double[n];
        new Tridiagonal(n).solve(lower, diagonal, upper, rhs, x);
        assertArrayEquals(expected, x, 1e-14, "both are backward stable; the system is well conditioned");
        new Tridiagonal(n).solve(lower, diagonal, upper, rhs, rhs);
        assertArrayEquals(x, rhs, 0, "solving in place gives the same");
    }
}
