package dev.dwellwise.thermal;

/**
 * Dormand–Prince 5(4) for one equation y' = f(t, y), with error control and the order-4 continuous
 * extension as dense output: the explicit pair of Hairer, Nørsett &amp; Wanner, <i>Solving Ordinary
 * Differential Equations I</i>, 2nd ed., Table II.5.2 (the tableau) and §II.6 (dense output, as in
 * their DOPRI5 code).
 *
 * <p>Why not Commons Math's integrator: for a single equation its general machinery (state mappers,
 * one interpolator object per step, event states) costs about ten times the arithmetic, and the
 * lumped model is the service's hot path. Commons Math's integrators stay as the independent
 * reference in the tests, and its {@code DormandPrince54FieldIntegrator} tableau is checked against
 * the one here.
 *
 * <p>Each {@link #integrate} call starts afresh (its own initial step) and fills a {@link Pieces}
 * store with flat arrays: no object per step. Not thread-safe; one per solve.
 */
final class ScalarDormandPrince {

    /** The right-hand side. */
    @FunctionalInterface
    interface Equation {
        double rate(double t, double y);
    }

    /** Asked after every accepted step whether the integration should end there. */
    @FunctionalInterface
    interface EndCheck {
        boolean endsAt(double t, double y);
    }

    // Tableau (HNW I, Table II.5.2). Row 7 equals the fifth-order weights: first same as last.
    static final double C2 = 1.0 / 5, C3 = 3.0 / 10, C4 = 4.0 / 5, C5 = 8.0 / 9;
    static final double A21 = 1.0 / 5;
    static final double A31 = 3.0 / 40, A32 = 9.0 / 40;
    static final double A41 = 44.0 / 45, A42 = -56.0 / 15, A43 = 32.0 / 9;
    static final double A51 = 19372.0 / 6561, A52 = -25360.0 / 2187, A53 = 64448.0 / 6561, A54 = -212.0 / 729;
    static final double A61 = 9017.0 / 3168, A62 = -355.0 / 33, A63 = 46732.0 / 5247, A64 = 49.0 / 176,
            A65 = -5103.0 / 18656;
    static final double A71 = 35.0 / 384, A73 = 500.0 / 1113, A74 = 125.0 / 192, A75 = -2187.0 / 6784,
            A76 = 11.0 / 84;
    /** Fifth-order minus embedded fourth-order weights: the local error estimate. */
    static final double E1 = 71.0 / 57600, E3 = -71.0 / 16695, E4 = 71.0 / 1920, E5 = -17253.0 / 339200,
            E6 = 22.0 / 525, E7 = -1.0 / 40;
    /** The continuous extension's quartic term (HNW I, §II.6, as in DOPRI5). */
    static final double D1 = -12715105075.0 / 11282082432.0, D3 = 87487479700.0 / 32700410799.0,
            D4 = -10690763975.0 / 1880347072.0, D5 = 701980252875.0 / 199316789632.0,
            D6 = -1453857185.0 / 822651844.0, D7 = 69997945.0 / 29380423;

    private static final double SAFETY = 0.9;
    private static final double MIN_FACTOR = 0.2;
    private static final double MAX_FACTOR = 10;

    private final double absoluteTolerance;
    private final double relativeTolerance;
    private long evaluations;

    ScalarDormandPrince(double absoluteTolerance, double relativeTolerance) {
        this.absoluteTolerance = absoluteTolerance;
        this.relativeTolerance = relativeTolerance;
    }

    long evaluations() {
        return evaluations;
    }

    /**
     * Integrates from (t0, y0) towards {@code limit}, appending every accepted step to {@code pieces},
     * until {@code limit} is reached or {@code end} accepts a step end. Returns the time reached;
     * the state there is {@link Pieces#lastValue()}.
     *
     * @param stepGuard called before every step with the steps taken so far in this call: where the
     *                  caller enforces its step, evaluation and wall-clock budgets
     * @throws ComputeLimitExceededException when the step size collapses below the clock's resolution
     * @throws IllegalArgumentException when {@code limit} is not a finite time after {@code t0}
     */
    double integrate(Equation f, double t0, double y0, double limit, EndCheck end, Pieces pieces,
                     java.util.function.LongConsumer stepGuard) {
        if (!(limit > t0) || !Double.isFinite(limit)) {
            throw new IllegalArgumentException("integrate to a finite time after " + t0 + ", not " + limit);
        }
        double t = t0;
        double y = y0;
        double k1 = f.rate(t, y);
        evaluations++;
        double h = initialStep(f, t, y, k1, limit - t);
        boolean rejectedLast = false;
        long taken = 0;
        while (true) {
            stepGuard.accept(taken);
            boolean lastStep = t + h >= limit || limit - (t + h) <= 8 * Math.ulp(limit);
            if (lastStep) {
                h = limit - t;
            }
            double k2 = f.rate(t + C2 * h, y + h * A21 * k1);
            double k3 = f.rate(t + C3 * h, y + h * (A31 * k1 + A32 * k2));
            double k4 = f.rate(t + C4 * h, y + h * (A41 * k1 + A42 * k2 + A43 * k3));
            double k5 = f.rate(t + C5 * h, y + h * (A51 * k1 + A52 * k2 + A53 * k3 + A54 * k4));
            double k6 = f.rate(t + h, y + h * (A61 * k1 + A62 * k2 + A63 * k3 + A64 * k4 + A65 * k5));
            double yNew = y + h * (A71 * k1 + A73 * k3 + A74 * k4 + A75 * k5 + A76 * k6);
            double tNew = lastStep ? limit : t + h;
            double k7 = f.rate(tNew, yNew);
            evaluations += 6;
            double errorEstimate = h * (E1 * k1 + E3 * k3 + E4 * k4 + E5 * k5 + E6 * k6 + E7 * k7);
            double scale = absoluteTolerance + relativeTolerance * Math.max(Math.abs(y), Math.abs(yNew));
            double error = Math.abs(errorEstimate) / scale;
            if (!(error <= 1)) { // NaN included: a lost step shrinks until it is resolved or refused
                h *= Math.max(MIN_FACTOR, Double.isFinite(error) ? SAFETY * Math.pow(error, -0.2) : MIN_FACTOR);
                rejectedLast = true;
                if (!(h > 8 * Math.ulp(Math.max(Math.abs(t), 1)))) { // NaN included: never loop on it
                    throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.UNRESOLVED,
                            "the lumped solve could not resolve the history at " + t + " s");
                }
                continue;
            }
            double difference = yNew - y;
            double hermite = h * k1 - difference;
            double quartic = h * (D1 * k1 + D3 * k3 + D4 * k4 + D5 * k5 + D6 * k6 + D7 * k7);
            pieces.add(t, tNew, y, difference, hermite, difference - h * k7 - hermite, quartic);
            taken++;
            t = tNew;
            y = yNew;
            k1 = k7; // first same as last
            if (lastStep || end.endsAt(t, y)) {
                return t;
            }
            double factor = error == 0 ? MAX_FACTOR : SAFETY * Math.pow(error, -0.2);
            h *= Math.min(rejectedLast ? 1 : MAX_FACTOR, Math.max(MIN_FACTOR, factor));
            rejectedLast = false;
        }
    }

    /** Initial step by the rule of HNW I, §II.4 ("starting step size"), bounded by the span. */
    private double initialStep(Equation f, double t, double y, double k1, double span) {
        double scale = absoluteTolerance + relativeTolerance * Math.abs(y);
        double d0 = Math.abs(y) / scale;
        double d1 = Math.abs(k1) / scale;
        double h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : 0.01 * d0 / d1;
        h0 = Math.min(h0, span);
        double k2 = f.rate(t + h0, y + h0 * k1);
        evaluations++;
        double d2 = Math.abs(k2 - k1) / scale / h0;
        double largest = Math.max(d1, d2);
        double h1 = largest <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : Math.pow(0.01 / largest, 0.2);
        double h = Math.min(Math.min(100 * h0, h1), span);
        return h > 0 ? h : span; // a NaN slope: the first step fails its error test and shrinks to refusal
    }

    /**
     * The accepted steps of one or more calls: per step its start, end and the five
     * coefficients of y(t0 + θh) = r1 + θ(r2 + (1−θ)(r3 + θ(r4 + (1−θ) r5))).
     */
    static final class Pieces {
        private static final int STRIDE = 5;
        private double[] data = new double[STRIDE * 32];
        private double[] knots = new double[33];
        private int count;
        private int cursor;
        private double lastValue;

        void add(double start, double end, double r1, double r2, double r3, double r4, double r5) {
            if (count == knots.length - 1) {
                knots = java.util.Arrays.copyOf(knots, 2 * count + 1);
                data = java.util.Arrays.copyOf(data, STRIDE * 2 * count);
            }
            int o = STRIDE * count;
            data[o] = r1;
            data[o + 1] = r2;
            data[o + 2] = r3;
            data[o + 3] = r4;
            data[o + 4] = r5;
            knots[count] = start;
            knots[count + 1] = end;
            count++;
            lastValue = r1 + r2;
        }

        int size() {
            return count;
        }

        double start() {
            return knots[0];
        }

        double end() {
            return knots[count];
        }

        /** Start of the last step. */
        double lastStart() {
            return knots[count - 1];
        }

        double lastValue() {
            return lastValue;
        }

        double[] knots() {
            return java.util.Arrays.copyOf(knots, count + 1);
        }

        /** The dense output at {@code t}, clamped to the covered span. */
        double valueAt(double t) {
            int i = pieceAt(t);
            int o = STRIDE * i;
            // against the knots themselves: a knot reads the same from the piece on either side
            double span = knots[i + 1] - knots[i];
            double theta = span > 0 ? Math.max(0, Math.min(1, (t - knots[i]) / span)) : 0;
            double rest = 1 - theta;
            return data[o] + theta * (data[o + 1] + rest * (data[o + 2] + theta * (data[o + 3] + rest * data[o + 4])));
        }

        /** The piece holding {@code t}: the last one used or its successor first, the usual in-order reads. */
        private int pieceAt(double t) {
            int c = cursor;
            if (t >= knots[c] && t <= knots[c + 1]) {
                return c;
            }
            if (c + 1 < count && t >= knots[c + 1] && t <= knots[c + 2]) {
                cursor = c + 1;
                return cursor;
            }
            int i = java.util.Arrays.binarySearch(knots, 0, count + 1, t);
            i = i >= 0 ? Math.min(i, count - 1) : Math.min(Math.max(-i - 2, 0), count - 1);
            cursor = i;
            return i;
        }
    }
}
