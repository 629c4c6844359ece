package dev.dwellwise.thermal;

/**
 * How finely the slab back end resolves a part.
 *
 * @param cells             finite-volume cells per conduction length (the thickness over the exposed
 *                          faces): a symmetric wall exposed on both faces is computed on its half
 *                          with this many, an asymmetric one with twice this many through the whole
 *                          thickness; every layer gets at least one
 * @param relativeTolerance relative tolerance of the local error control of the time integration
 */
public record SlabResolution(int cells, double relativeTolerance) {

    /**
     * Default cells: with the default tolerance, within 0.05 K of a converged solution on the
     * representative jobs of {@code SlabDefaultResolutionTest} (measured: at most about 0.02 K, the
     * spatial error of walls at Biot numbers of 1 to 15).
     */
    public static final int DEFAULT_CELLS = 40;

    /**
     * Default tolerance: about 4e-5 K of local error per step on a 400 K part; over a one-hour job
     * about 0.001 K of temporal error, which leaves the 0.05 K target to the spatial error, and event
     * times within about 0.1 s.
     */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-7;

    /** Far beyond any accuracy need; keeps a resolution from a job from allocating without bound. */
    public static final int MAX_CELLS = 10_000;

    public SlabResolution {
        if (cells < 2 || cells > MAX_CELLS) {
            throw new IllegalArgumentException("cells must lie in [2, " + MAX_CELLS + "]");
        }
        if (!(relativeTolerance > 0 && relativeTolerance < 1e-2)) {
            throw new IllegalArgumentException("relative tolerance must lie in (0, 0.01)");
        }
    }

    public static SlabResolution standard() {
        return new SlabResolution(DEFAULT_CELLS, DEFAULT_RELATIVE_TOLERANCE);
    }

    public SlabResolution withCells(int n) {
        return new SlabResolution(n, relativeTolerance);
    }

    public SlabResolution withRelativeTolerance(double tolerance) {
        return new SlabResolution(cells, tolerance);
    }
}
