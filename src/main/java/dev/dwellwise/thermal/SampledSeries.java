package dev.dwellwise.thermal;

import java.util.Arrays;

/**
 * The output samples, columnar: one growable primitive array per quantity (kelvin, seconds).
 * Append-only while a solve runs; read through the copying accessors afterwards.
 */
public final class SampledSeries {

    /** Room for the stage boundaries of a summary answer, which samples nothing else; doubled as needed. */
    private static final int INITIAL = 8;

    private final int capacity;
    private double[] time = new double[INITIAL];
    private double[] mean = new double[INITIAL];
    private double[] surface = new double[INITIAL];
    private double[] core = new double[INITIAL];
    private int[] stage = new int[INITIAL];
    private int size;

    public SampledSeries(int capacity) {
        this.capacity = capacity;
    }

    /**
     * A stage boundary: one sample however many stages meet at that instant (zero-length stages),
     * carrying the index of the last stage that starts there.
     */
    void addBoundary(double t, Observation o, int stageIndex, double sameInstant) {
        if (size > 0 && Math.abs(time[size - 1] - t) <= sameInstant) {
            size--;
        }
        add(t, o, stageIndex);
    }

    void add(double t, Observation o, int stageIndex) {
        if (size == capacity) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.SAMPLES,
                    "the series would have more than " + capacity + " samples");
        }
        if (size == time.length) {
            int n = size * 2;
            time = Arrays.copyOf(time, n);
            mean = Arrays.copyOf(mean, n);
            surface = Arrays.copyOf(surface, n);
            core = Arrays.copyOf(core, n);
            stage = Arrays.copyOf(stage, n);
        }
        time[size] = t;
        mean[size] = o.meanK();
        surface[size] = o.surfaceK();
        core[size] = o.coreK();
        stage[size] = stageIndex;
        size++;
    }

    public int size() {
        return size;
    }

    public double[] timeSeconds() {
        return Arrays.copyOf(time, size);
    }

    public double[] meanK() {
        return Arrays.copyOf(mean, size);
    }

    public double[] surfaceK() {
        return Arrays.copyOf(surface, size);
    }

    public double[] coreK() {
        return Arrays.copyOf(core, size);
    }

    public int[] stageIndex() {
        return Arrays.copyOf(stage, size);
    }
}
