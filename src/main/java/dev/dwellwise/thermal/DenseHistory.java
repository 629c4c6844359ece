package dev.dwellwise.thermal;

import java.util.ArrayList;
import java.util.List;

/**
 * The whole computed history as a continuous function of time: the back end's dense segments,
 * each cut to the span that was kept. Lets later stages of the analysis (cure kinetics, time above
 * a temperature) integrate along the true solution instead of the sparse output samples.
 */
public final class DenseHistory {

    private final List<Segment> segments = new ArrayList<>();
    private final List<double[]> spans = new ArrayList<>();

    void add(Segment segment, double from, double to) {
        if (to > from) {
            segments.add(segment);
            spans.add(new double[] {from, to});
        }
    }

    public double startSeconds() {
        return spans.isEmpty() ? 0 : spans.get(0)[0];
    }

    public double endSeconds() {
        return spans.isEmpty() ? 0 : spans.get(spans.size() - 1)[1];
    }

    /** The temperatures at {@code t}, clamped to the covered span. */
    public Observation at(double t) {
        if (spans.isEmpty()) {
            throw new IllegalStateException("empty history");
        }
        int lo = 0;
        int hi = spans.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (spans.get(mid)[0] <= t) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        double[] span = spans.get(lo);
        return segments.get(lo).at(Math.max(span[0], Math.min(span[1], t)));
    }

    /**
     * Every time at which the interpolant changes piece, ascending and without repeats: quadrature
     * over the history should not straddle these.
     */
    public double[] knots() {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < segments.size(); i++) {
            double[] span = spans.get(i);
            addKnot(out, span[0]);
            for (double k : segments.get(i).knots()) {
                if (k > span[0] && k < span[1]) {
                    addKnot(out, k);
                }
            }
            addKnot(out, span[1]);
        }
        double[] result = new double[out.size()];
        for (int i = 0; i < result.length; i++) {
            result[i] = out.get(i);
        }
        return result;
    }

    private static void addKnot(List<Double> out, double k) {
        if (out.isEmpty() || k > out.get(out.size() - 1)) {
            out.add(k);
        }
    }
}
