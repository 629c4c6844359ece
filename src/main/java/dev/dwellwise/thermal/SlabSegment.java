package dev.dwellwise.thermal;

/**
 * Dense output of one accepted slab step: per cell, the cubic Hermite interpolant of the
 * temperatures and their rates at both step ends (third-order accurate in the step, above the
 * method's second order). Immutable: the arrays are the step's own.
 */
final class SlabSegment implements Segment {

    private final SlabReadout readout;
    private final SurfaceExposure exposure;
    private final double start;
    private final double end;
    private final double[] startK;
    private final double[] startRate;
    private final double[] endK;
    private final double[] endRate;

    SlabSegment(SlabReadout readout, SurfaceExposure exposure, double start, double end,
                double[] startK, double[] startRate, double[] endK, double[] endRate) {
        this.readout = readout;
        this.exposure = exposure;
        this.start = start;
        this.end = end;
        this.startK = startK;
        this.startRate = startRate;
        this.endK = endK;
        this.endRate = endRate;
    }

    @Override
    public double start() {
        return start;
    }

    @Override
    public double end() {
        return end;
    }

    @Override
    public double[] knots() {
        return new double[] {start, end};
    }

    /** The same interpolant ending at {@code time} inside the step: a cubic is fixed by its values and slopes at two points. */
    SlabSegment endingAt(double time) {
        return new SlabSegment(readout, exposure, start, time, startK, startRate, cellsAt(time), ratesAt(time));
    }

    /** Cell temperatures at t, kelvin; t is held inside the step (round-off at its ends). */
    double[] cellsAt(double t) {
        double h = end - start;
        double s = Math.max(0, Math.min(1, (t - start) / h));
        double s2 = s * s;
        double s3 = s2 * s;
        double h00 = 2 * s3 - 3 * s2 + 1;
        double h10 = (s3 - 2 * s2 + s) * h;
        double h01 = -2 * s3 + 3 * s2;
        double h11 = (s3 - s2) * h;
        double[] k = new double[startK.length];
        for (int i = 0; i < k.length; i++) {
            k[i] = h00 * startK[i] + h10 * startRate[i] + h01 * endK[i] + h11 * endRate[i];
        }
        return k;
    }

    /** Cell rates dT/dt at t, K/s: the derivative of the interpolant. */
    double[] ratesAt(double t) {
        double h = end - start;
        double s = Math.max(0, Math.min(1, (t - start) / h));
        double s2 = s * s;
        double d00 = (6 * s2 - 6 * s) / h;
        double d10 = 3 * s2 - 4 * s + 1;
        double d01 = -d00;
        double d11 = 3 * s2 - 2 * s;
        double[] rate = new double[startK.length];
        for (int i = 0; i < rate.length; i++) {
            rate[i] = d00 * startK[i] + d10 * startRate[i] + d01 * endK[i] + d11 * endRate[i];
        }
        return rate;
    }

    @Override
    public Observation at(double t) {
        return readout.observe(t, cellsAt(t), exposure);
    }

    @Override
    public double meanRateAt(double t) {
        return readout.meanRate(cellsAt(t), ratesAt(t));
    }

    @Override
    public double[] profileAt(double t) {
        return readout.profile(t, cellsAt(t), exposure);
    }
}
