package dev.dwellwise.thermal;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Runs a {@link ThermalProblem} through any back end's {@link Stepper}: stage after stage on one
 * clock, ending each stage at its condition (located by root finding on the dense output, never
 * rounded to a step), at its duration, or at its maxSeconds bound; sampling at absolute multiples
 * of the sample spacing plus every boundary; and gathering the per-stage figures.
 *
 * <p>Every segment is scanned at its knots and knot midpoints; a sign change of an event function
 * between two scan points is refined with {@link EventLocator}. A double crossing inside half a
 * step would go unseen, which the step-size control makes far smaller than the tolerances.
 */
public final class StageRunner {

    /** Times closer than this are the same instant (a sample on a stage boundary appears once). */
    private static final double SAME_INSTANT = 1e-9;

    private final ThermalProblem problem;
    private final Stepper stepper;
    private final SampledSeries series;
    private final DenseHistory dense = new DenseHistory();
    private final List<Profile> profiles = new ArrayList<>();
    private final List<Double> pendingProfiles;
    private final Deadline deadline;
    private double largestRate = 0;
    private double peakK;

    private StageRunner(ThermalProblem problem, Stepper stepper, Deadline deadline) {
        this.problem = problem;
        this.stepper = stepper;
        this.series = new SampledSeries(problem.budget().maxSamples());
        this.pendingProfiles = new ArrayList<>(problem.profileTimes());
        this.pendingProfiles.sort(Double::compare);
        this.peakK = problem.part().initialK();
        this.deadline = deadline;
    }

    /** Computes the history of the problem with the model, as a whole solve of its own. */
    public static ThermalHistory run(ThermalProblem problem, ThermalModel model) {
        return run(problem, model, Deadline.startingNow(problem.budget()));
    }

    /** Computes the history of the problem with the model, as one run of a solve that ends at {@code deadline}. */
    static ThermalHistory run(ThermalProblem problem, ThermalModel model, Deadline deadline) {
        Stepper stepper = model.newStepper(problem.part(), problem.budget(), deadline);
        return new StageRunner(problem, stepper, deadline).runAll(model.name());
    }

    private ThermalHistory runAll(String modelName) {
        List<StageOutcome> outcomes = new ArrayList<>();
        takeProfilesUpTo(0, null);
        for (int i = 0; i < problem.stages().size(); i++) {
            outcomes.add(runStage(i, problem.stages().get(i)));
        }
        double end = stepper.time();
        series.addBoundary(end, stepper.observe(), problem.stages().size() - 1, SAME_INSTANT);
        return new ThermalHistory(modelName, outcomes, series, dense, profiles, largestRate, peakK,
                stepper.steps(), stepper.evaluations());
    }

    private StageOutcome runStage(int index, StageConditions stage) {
        stepper.enterStage(stage);
        double start = stepper.time();
        double bound = start + stage.boundSeconds();
        Observation first = stepper.observe();
        series.addBoundary(start, first, index, SAME_INSTANT);
        StageFigures figures = new StageFigures(problem.part().emissivity(), stage, start, first);
        HoldClock hold = stage.end() instanceof EndCondition.HoldAbove h
                ? new HoldClock(h.kelvin(), h.seconds(), first.coldestK()) : null;

        StageEnd ended = null;
        if (alreadyMet(stage.end(), first)) {
            ended = StageEnd.REACHED;
        }
        if (hold != null && hold.isComplete()) {
            ended = StageEnd.HOLD_COMPLETE;
        }
        while (ended == null) {
            if (tooShort(stepper.time(), bound)) {
                ended = stage.end() instanceof EndCondition.AfterDuration
                        ? StageEnd.DURATION : StageEnd.MAX_SECONDS;
                break;
            }
            if (hold != null && hold.above && tooShort(stepper.time(), stepper.time() + hold.remaining())) {
                ended = StageEnd.HOLD_COMPLETE; // what is left of the hold is below any time resolution
                hold.accumulated = hold.required;
                break;
            }
            Segment segment = hold != null && hold.above
                    ? stepper.advance(Math.min(bound, stepper.time() + hold.remaining()), hold.stopSignal())
                    : stepper.advance(bound, stopSignal(stage.end(), hold));
            checkBudget();
            requireFinite(segment);
            double[] scan = scanPoints(segment);
            Observation[] seen = new Observation[scan.length];
            for (int i = 0; i < scan.length; i++) {
                seen[i] = segment.at(scan[i]); // read once: events, hold and figures all walk these
            }
            double eventTime = findEvent(stage.end(), hold, segment, scan, seen);
            double keptEnd = Double.isNaN(eventTime) ? segment.end() : eventTime;
            dense.add(segment, segment.start(), keptEnd);
            figures.cover(segment, scan, seen, keptEnd);
            largestRate = Math.max(largestRate, figures.largestRate);
            peakK = Math.max(peakK, figures.peakK);
            boolean stageEnds = !Double.isNaN(eventTime) || tooShort(keptEnd, bound);
            sampleInside(segment, segment.start(), keptEnd, !stageEnds, index);
            takeProfilesUpTo(keptEnd, segment);
            if (!Double.isNaN(eventTime)) {
                stepper.cutAt(eventTime);
                ended = hold != null ? StageEnd.HOLD_COMPLETE : StageEnd.REACHED;
            }
        }
        Observation last = stepper.observe();
        double endTime = stepper.time();
        double lowK = Math.min(figures.lowK, last.coldestK());
        double highK = Math.max(figures.peakK, last.hottestK());
        double k = problem.part().effectiveConductivity(lowK, highK);
        double biot = (stage.convection() + figures.largestHr) * problem.part().characteristicLengthM() / k;
        return new StageOutcome(stage, start, endTime, ended, first, last, figures.peakK, figures.largestHr,
                biot, SteadyState.of(stage, problem.part().emissivity(), first.meanK()),
                hold == null ? 0 : hold.accumulated, figures.largestRate);
    }

    /**
     * Whether the span from {@code from} to {@code to} is too short to integrate: below a nanosecond,
     * or below the relative resolution of a time on the clock (the integrator refuses such spans).
     */
    private static boolean tooShort(double from, double to) {
        return to - from <= SAME_INSTANT + 1e-11 * Math.abs(to);
    }

    private static boolean alreadyMet(EndCondition end, Observation o) {
        if (end instanceof EndCondition.ColdestReaches c) {
            return o.coldestK() >= c.kelvin();
        }
        if (end instanceof EndCondition.HottestFallsTo c) {
            return o.hottestK() <= c.kelvin();
        }
        return false;
    }

    /** Where the stepper may stop early: the stage's condition, or the hold's next crossing. */
    private static StopSignal stopSignal(EndCondition end, HoldClock hold) {
        if (end instanceof EndCondition.ColdestReaches c) {
            return o -> o.coldestK() - c.kelvin();
        }
        if (end instanceof EndCondition.HottestFallsTo c) {
            return o -> c.kelvin() - o.hottestK();
        }
        return hold != null ? hold.stopSignal() : StopSignal.NONE;
    }

    /** The first time in the segment at which the stage's condition is met, or NaN. */
    private static double findEvent(EndCondition end, HoldClock hold, Segment segment, double[] scan,
                                    Observation[] seen) {
        if (end instanceof EndCondition.ColdestReaches c) {
            return EventLocator.firstRise(t -> segment.at(t).coldestK() - c.kelvin(), scan,
                    i -> seen[i].coldestK() - c.kelvin());
        }
        if (end instanceof EndCondition.HottestFallsTo c) {
            return EventLocator.firstRise(t -> c.kelvin() - segment.at(t).hottestK(), scan,
                    i -> c.kelvin() - seen[i].hottestK());
        }
        if (hold != null) {
            return hold.advance(t -> segment.at(t).coldestK(), scan, seen);
        }
        return Double.NaN;
    }

    /**
     * Samples at the multiples of the spacing in (from, to), and at {@code to} itself when it is a
     * plain step end rather than the stage end (whose sample is the next stage's boundary sample).
     */
    private void sampleInside(Segment segment, double from, double to, boolean includeEnd, int stageIndex) {
        double dt = problem.sampleSeconds();
        double last = includeEnd ? to + SAME_INSTANT : to - SAME_INSTANT;
        long k = (long) Math.floor(from / dt) + 1;
        for (double t = k * dt; t < last; t = (++k) * dt) {
            if (t > from + SAME_INSTANT) {
                series.add(t, segment.at(Math.min(t, to)), stageIndex);
            }
        }
    }

    private void takeProfilesUpTo(double to, Segment segment) {
        while (!pendingProfiles.isEmpty() && pendingProfiles.get(0) <= to + SAME_INSTANT) {
            double t = pendingProfiles.remove(0);
            double[] temps = segment == null ? initialProfile() : segment.profileAt(Math.max(segment.start(), t));
            profiles.add(new Profile(t, stepper.profilePositionsM(), temps));
        }
    }

    private double[] initialProfile() {
        double[] temps = new double[stepper.profilePositionsM().length];
        java.util.Arrays.fill(temps, problem.part().initialK());
        return temps;
    }

    private void checkBudget() {
        ComputeBudget budget = problem.budget();
        if (stepper.steps() > budget.maxSteps()) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.STEPS,
                    "the solve needed more than " + budget.maxSteps() + " steps");
        }
        if (stepper.evaluations() > budget.maxEvaluations()) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.EVALUATIONS,
                    "the solve needed more than " + budget.maxEvaluations() + " evaluations");
        }
        deadline.check();
    }

    /** A back end that lost its numbers must answer with a problem, never with NaN in a result. */
    private static void requireFinite(Segment segment) {
        Observation end = segment.at(segment.end());
        if (!(Double.isFinite(end.meanK()) && Double.isFinite(end.coldestK()) && Double.isFinite(end.hottestK()))) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.UNRESOLVED,
                    "the solver lost precision at " + segment.end() + " s");
        }
    }

    /** The segment's knots with the midpoint of every piece between them. */
    static double[] scanPoints(Segment segment) {
        double[] knots = segment.knots();
        double[] scan = new double[2 * knots.length - 1];
        for (int i = 0; i < knots.length; i++) {
            scan[2 * i] = knots[i];
            if (i + 1 < knots.length) {
                scan[2 * i + 1] = 0.5 * (knots[i] + knots[i + 1]);
            }
        }
        return scan;
    }

    /**
     * Cumulative time at or above a temperature within one stage, with the instant at which it
     * reaches the required hold.
     */
    private static final class HoldClock {
        /** Kelvin below the hold temperature at which a stepper may stop: a fall, not the touch at entry. */
        private static final double CROSSING_MARGIN = 1e-9;
        private final double kelvin;
        private final double required;
        private double accumulated;
        private boolean above;

        HoldClock(double kelvin, double required, double startColdestK) {
            this.kelvin = kelvin;
            this.required = required;
            this.above = startColdestK >= kelvin;
        }

        boolean isComplete() {
            return above && required <= 0;
        }

        /** Hold time still to go, seconds. */
        double remaining() {
            return required - accumulated;
        }

        /** The next crossing of the hold temperature: falling below it while above, rising to it while below. */
        StopSignal stopSignal() {
            return above ? o -> kelvin - o.coldestK() - CROSSING_MARGIN : o -> o.coldestK() - kelvin;
        }

        /** Walks the scan points (observed as {@code seen}); returns the completion time inside them, or NaN. */
        double advance(DoubleUnaryOperator coldestK, double[] scan, Observation[] seen) {
            DoubleUnaryOperator g = t -> coldestK.applyAsDouble(t) - kelvin;
            for (int i = 0; i + 1 < scan.length; i++) {
                double p = scan[i];
                double q = scan[i + 1];
                boolean aboveAtQ = seen[i + 1].coldestK() - kelvin >= 0;
                double enter = p;
                double leave = q;
                // a window that already starts across the line has its crossing at its start (no
                // bracket to search: the previous segment ended a hair short of it)
                if (!above && aboveAtQ) {
                    enter = seen[i].coldestK() - kelvin >= 0 ? p : EventLocator.root(g, p, q);
                } else if (above && !aboveAtQ) {
                    leave = seen[i].coldestK() - kelvin < 0 ? p : EventLocator.root(g, p, q);
                } else if (!above) {
                    continue;
                }
                double completes = enter + (required - accumulated);
                if (completes <= leave + SAME_INSTANT) {
                    // the window may end on the completion time itself, give or take rounding
                    accumulated = required;
                    return Math.min(completes, leave);
                }
                accumulated += leave - enter;
                above = aboveAtQ;
            }
            return Double.NaN;
        }
    }

    /** Per-stage extremes gathered over the segments, kelvin and K/s. */
    private static final class StageFigures {
        /**
         * A rise smaller than this between scan points (kelvin, or kelvin per second for rates) is
         * integration noise, not a peak worth refining.
         */
        private static final double PEAK_NOISE = 1e-9;

        private final double emissivity;
        private final StageConditions stage;
        private final double stageStart;
        private double peakK;
        private double lowK;
        private double largestHr;
        private double largestRate;

        StageFigures(double emissivity, StageConditions stage, double stageStart, Observation first) {
            this.emissivity = emissivity;
            this.stage = stage;
            this.stageStart = stageStart;
            this.peakK = first.hottestK();
            this.lowK = first.coldestK();
            this.largestHr = hr(stageStart, first);
        }

        private double hr(double t, Observation o) {
            return Physics.radiationCoefficient(emissivity, o.surfaceK(), stage.surroundingsK(t - stageStart));
        }

        /** Takes in the scan points before {@code keptEnd} (observed as {@code seen}) and keptEnd itself. */
        void cover(Segment segment, double[] scan, Observation[] seen, double keptEnd) {
            int n = 0;
            while (n < scan.length && scan[n] < keptEnd) {
                n++;
            }
            double[] times = java.util.Arrays.copyOf(scan, n + 1);
            times[n] = keptEnd;
            double[] hot = new double[times.length];
            double[] rate = new double[times.length];
            for (int i = 0; i < times.length; i++) {
                Observation o = i < n ? seen[i] : segment.at(keptEnd);
                hot[i] = o.hottestK();
                largestHr = Math.max(largestHr, hr(times[i], o));
                lowK = Math.min(lowK, o.coldestK());
                peakK = Math.max(peakK, hot[i]);
                rate[i] = segment.meanRateAt(times[i], o);
                largestRate = Math.max(largestRate, rate[i]);
            }
            for (int i = 1; i + 1 < times.length; i++) {
                if (rate[i] > rate[i - 1] + PEAK_NOISE && rate[i] > rate[i + 1] + PEAK_NOISE) {
                    // the heating rate peaks inside a step (a ramp, or a slab's mean): refine it too
                    largestRate = Math.max(largestRate, EventLocator.maximum(segment::meanRateAt,
                            times[i - 1], times[i + 1]));
                }
                if (hot[i] > hot[i - 1] + PEAK_NOISE && hot[i] > hot[i + 1] + PEAK_NOISE) {
                    // an interior maximum: refine it between the neighbouring scan points
                    peakK = Math.max(peakK, EventLocator.maximum(t -> segment.at(t).hottestK(),
                            times[i - 1], times[i + 1]));
                }
            }
        }
    }
}
