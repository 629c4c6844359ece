package dev.dwellwise.thermal;

import java.util.Arrays;

/**
 * Steps the slab of {@link SlabModel} with {@link TrBdf2}, one accepted step per {@link #advance}.
 * Step control on the weighted max norm of the local error estimate: accept when it is at most 1,
 * next step h · min(5, max(0.2, 0.9 err^(−1/3))) (the estimate is O(h³)), no growth right after a
 * rejection, a quarter of the step after a Newton failure. A stage starts with a step whose explicit
 * change would be one error unit: the boundary conditions jump there, and the controller grows it
 * fivefold per step. State: the cell temperatures, kelvin, and their flux F (reused as the next
 * step's first stage).
 */
final class SlabStepper implements Stepper {

    private static final double SAFETY = 0.9;
    private static final double MAX_GROWTH = 5;
    private static final double MAX_SHRINK = 0.2;
    private static final double NEWTON_FAILURE_SHRINK = 0.25;
    /** A step that would leave less than a tenth of itself before the limit is stretched to it. */
    private static final double STRETCH = 1.1;

    private final ThermalPart part;
    private final SlabGrid grid;
    private final TrBdf2 method;
    private final SlabReadout readout;
    private final ComputeBudget budget;
    private final double relativeTolerance;
    private SurfaceExposure exposure;
    private StageConditions stage;
    private double t;
    private double[] y;
    private TrBdf2.Derivative derivative;
    private double nextStep = Double.NaN;
    private long steps;
    private SlabSegment last;
    /** The temperature of the last segment when the part had settled there, else NaN. */
    private double settledK = Double.NaN;
    /** Whether the state is where the last step entered the settle band (cut there by {@link #advance(double, StopSignal)}). */
    private boolean atBandEntry;

    SlabStepper(ThermalPart part, SlabGrid grid, double relativeTolerance, ComputeBudget budget) {
        this.part = part;
        this.grid = grid;
        SlabEquations equations = new SlabEquations(grid);
        this.method = new TrBdf2(equations, relativeTolerance);
        this.readout = new SlabReadout(equations);
        this.budget = budget;
        this.relativeTolerance = relativeTolerance;
        this.y = new double[grid.cells()];
        Arrays.fill(y, part.initialK());
        this.exposure = SurfaceExposure.none(part.initialK());
    }

    @Override
    public void enterStage(StageConditions stage) {
        this.stage = stage;
        atBandEntry = false;
        exposure = new SurfaceExposure(stage, t, part.emissivity());
        derivative = method.derivative(t, y, exposure);
        nextStep = Double.NaN;
    }

    @Override
    public double time() {
        return t;
    }

    @Override
    public Observation observe() {
        return readout.observe(t, y, exposure);
    }

    /** Whether the last attempt was at the smallest step the clock resolves. */
    private boolean lastTriedMinimum;

    /**
     * One step, or, when every cell is within the settle band of the stage's steady temperature (see
     * {@link SettledSegment#steadyK}), the settled part to {@code limit}: as for a lumped part, a
     * condition at the steady temperature itself is then met where the part settles, and a long soak
     * takes no more steps. A step that brings every cell within the band ends where it did so.
     */
    @Override
    public Segment advance(double limit, StopSignal stop) {
        if (stage == null || !(limit > t)) {
            return advance(limit);
        }
        double steadyK = SettledSegment.steadyK(stage, part.emissivity(), readout.mean(y), stop);
        // at a band entry the part settles even where the steady temperature, recomputed from the
        // mean (no heat exchanged), has moved by a rounding unit since the cut
        if (SettledSegment.within(y, steadyK) || atBandEntry && !Double.isNaN(steadyK)) {
            y = filled(steadyK); // a fresh array: the last step's segment still reads the old one
            derivative = method.derivative(limit, y, exposure);
            Segment segment = new SettledSegment(t, limit, steadyK, readout.meanRate(y, derivative.rate()),
                    grid.profilePositionsM().length);
            t = limit;
            settledK = steadyK;
            steps++;
            return segment;
        }
        advance(limit);
        if (SettledSegment.within(y, steadyK)) {
            // the step came within the band: end it where it entered, and the next call settles there
            SlabSegment step = last;
            double entry = SettledSegment.bandEntry(time -> SettledSegment.deviationK(step.cellsAt(time), steadyK),
                    step.start(), step.end(), steadyK);
            if (entry < step.end()) {
                last = step.endingAt(entry);
                cutAt(entry);
            }
            atBandEntry = true;
        }
        return last;
    }

    @Override
    public Segment advance(double limit) {
        settledK = Double.NaN;
        atBandEntry = false;
        if (derivative == null) {
            throw new IllegalStateException("enterStage must come before advance");
        }
        if (!(limit > t)) {
            throw new IllegalArgumentException("the limit " + limit + " s is not after the current time " + t + " s");
        }
        if (Double.isNaN(nextStep)) {
            nextStep = initialStep(limit - t);
        }
        boolean rejected = false;
        // a step must move the clock: below a few rounding units of t the interpolant would divide by zero
        double minStep = 8 * Math.ulp(Math.max(1.0, Math.abs(t)));
        while (true) {
            double remaining = limit - t;
            if (nextStep < minStep) {
                if (rejected && lastTriedMinimum) { // the smallest step the clock resolves failed too
                    throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.UNRESOLVED,
                            "the slab solve could not take a time step at " + t + " s");
                }
                nextStep = minStep;
            }
            lastTriedMinimum = nextStep == minStep;
            double h = nextStep * STRETCH >= remaining ? remaining : nextStep;
            TrBdf2.Step step = method.attempt(t, h, y, derivative, exposure);
            checkBudget();
            if (step != null && !Double.isFinite(step.errorNorm())) {
                step = null; // a non-finite state is a failed step, like a Newton failure
            }
            if (step == null) {
                nextStep = h * NEWTON_FAILURE_SHRINK;
                rejected = true;
                continue;
            }
            // an error of zero (nothing changing) asks for the largest growth, not a division by zero
            double factor = SAFETY * Math.pow(Math.max(step.errorNorm(), 1e-12), -1.0 / 3);
            if (step.errorNorm() <= 1) {
                double end = h == remaining ? limit : t + h;
                last = new SlabSegment(readout, exposure, t, end, y, derivative.rate(), step.end(),
                        step.derivative().rate());
                t = end;
                y = step.end();
                derivative = step.derivative();
                steps++;
                nextStep = h * Math.min(rejected ? 1 : MAX_GROWTH, Math.max(MAX_SHRINK, factor));
                return last;
            }
            nextStep = h * Math.max(MAX_SHRINK, factor);
            rejected = true;
        }
    }

    /** The step whose explicit change dT/dt · h would be one error unit in the fastest cell. */
    private double initialStep(double remaining) {
        double fastest = 0;
        double[] rate = derivative.rate();
        for (int i = 0; i < y.length; i++) {
            double weight = relativeTolerance * y[i];
            fastest = Math.max(fastest, Math.abs(rate[i]) / weight);
        }
        return fastest > 0 ? Math.min(remaining, 1 / fastest) : remaining;
    }

    private void checkBudget() {
        if (method.solves() > budget.maxEvaluations()) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.EVALUATIONS,
                    "the solve needed more than " + budget.maxEvaluations() + " evaluations");
        }
    }

    /** Back to the interpolated state at {@code time}; its flux is evaluated afresh for the next step. */
    @Override
    public void cutAt(double time) {
        atBandEntry = false;
        y = Double.isNaN(settledK) ? last.cellsAt(time) : filled(settledK);
        t = time;
        derivative = method.derivative(t, y, exposure);
    }

    private double[] filled(double kelvin) {
        double[] cells = new double[y.length];
        Arrays.fill(cells, kelvin);
        return cells;
    }

    @Override
    public long steps() {
        return steps;
    }

    /** Tridiagonal (Newton and error-filter) solves. */
    @Override
    public long evaluations() {
        return method.solves();
    }

    @Override
    public double[] profilePositionsM() {
        return grid.profilePositionsM();
    }
}
