package dev.dwellwise.thermal;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Steps the lumped balance of {@link LumpedModel} with Commons Math. The integrator drives its own
 * loop, so each {@link #advance} is one integration call, to the limit or to the runner's stop
 * signal (a Commons Math event handler), keeping copies of the step interpolators as the dense
 * output. State: y[0] = T, kelvin.
 */
final class LumpedStepper implements Stepper {

    private final ThermalPart part;
    private final ComputeBudget budget;
    private final Deadline deadline;
    private final DormandPrince853Integrator integrator;
    private final double faces;
    /** The layers as arrays: C(T) is evaluated at every right-hand-side call. */
    private final Material[] materials;
    private final double[] thicknesses;
    private StageConditions stage;
    private double stageStart;
    private double t;
    private double temperatureK;
    private long steps;
    private long evaluations;
    private Segment last;
    private final FirstOrderDifferentialEquations equations = new FirstOrderDifferentialEquations() {
        @Override
        public int getDimension() {
            return 1;
        }

        @Override
        public void computeDerivatives(double time, double[] state, double[] derivative) {
            derivative[0] = rate(time, state[0]);
        }
    };

    LumpedStepper(ThermalPart part, ComputeBudget budget) {
        this.part = part;
        this.budget = budget;
        this.deadline = Deadline.startingNow(budget);
        this.faces = part.exposedFaces();
        this.materials = part.layers().stream().map(Layer::material).toArray(Material[]::new);
        this.thicknesses = part.layers().stream().mapToDouble(Layer::thicknessM).toArray();
        this.integrator = new DormandPrince853Integrator(1e-9, 1e7,
                LumpedModel.ABSOLUTE_TOLERANCE, LumpedModel.RELATIVE_TOLERANCE);
        this.temperatureK = part.initialK();
    }

    /** dT/dt at time {@code time} and temperature {@code k}, K/s. */
    private double rate(double time, double k) {
        double elapsed = time - stageStart;
        double q = Physics.surfaceFlux(stage.convection(), stage.airK(elapsed), part.emissivity(),
                stage.surroundingsK(elapsed), k);
        double capacity = 0;
        for (int i = 0; i < materials.length; i++) {
            capacity += materials[i].volumetricHeatCapacity(k) * thicknesses[i];
        }
        return faces * q / capacity;
    }

    @Override
    public void enterStage(StageConditions conditions) {
        this.stage = conditions;
        this.stageStart = t;
    }

    @Override
    public double time() {
        return t;
    }

    @Override
    public Observation observe() {
        return Observation.uniform(temperatureK);
    }

    @Override
    public Segment advance(double limit) {
        return advance(limit, StopSignal.NONE);
    }

    /**
     * Integrates to {@code limit} in one call, or until {@code stop} rises through zero: a Commons
     * Math event handler ends the integration just after that root, so a stage costs one call.
     */
    @Override
    public Segment advance(double limit, StopSignal stop) {
        double steadyK = constantStage() ? SteadyState.of(stage, part.emissivity(), temperatureK) : Double.NaN;
        if (Math.abs(temperatureK - steadyK) <= SETTLED_K) {
            // settled under fixed surroundings: nothing left to integrate, and a thin part with strong
            // convection would otherwise spend the step budget on the explicit method's stability limit
            last = new SettledSegment(t, limit, steadyK, rate(limit, steadyK));
            t = limit;
            temperatureK = steadyK;
            steps++;
            return last;
        }
        List<StepInterpolator> pieces = new ArrayList<>();
        integrator.clearStepHandlers();
        integrator.clearEventHandlers();
        integrator.addStepHandler(new StepHandler() {
            @Override
            public void init(double t0, double[] y0, double tEnd) {
            }

            @Override
            public void handleStep(StepInterpolator interpolator, boolean isLast) {
                deadline.check(); // one call can hold thousands of steps: stop inside it
                if (steps + pieces.size() >= budget.maxSteps()) {
                    throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.STEPS,
                            "the solve needed more than " + budget.maxSteps() + " steps");
                }
                pieces.add(interpolator.copy());
            }
        });
        if (stop != StopSignal.NONE) {
            integrator.addEventHandler(new StopAt(stop), Double.POSITIVE_INFINITY, EVENT_CONVERGENCE, 100);
        }
        if (!Double.isNaN(steadyK)) {
            double target = steadyK;
            integrator.addEventHandler(new StopAt(o -> SETTLED_K - Math.abs(o.meanK() - target)),
                    Double.POSITIVE_INFINITY, EVENT_CONVERGENCE, 100);
        }
        integrator.setMaxEvaluations((int) Math.max(1, Math.min(Integer.MAX_VALUE,
                budget.maxEvaluations() - evaluations)));
        double[] y = {temperatureK};
        double reached;
        try {
            reached = integrator.integrate(equations, t, y, limit, y);
        } catch (MaxCountExceededException e) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.EVALUATIONS,
                    "the solve needed more than " + budget.maxEvaluations() + " evaluations");
        }
        evaluations += integrator.getEvaluations();
        steps += pieces.size();
        last = new LumpedSegment(pieces, this::rate);
        t = reached;
        temperatureK = y[0];
        return last;
    }

    @Override
    public void cutAt(double time) {
        temperatureK = last.at(time).meanK();
        t = time;
    }

    @Override
    public long steps() {
        return steps;
    }

    @Override
    public long evaluations() {
        return evaluations;
    }

    @Override
    public double[] profilePositionsM() {
        return new double[] {0, part.thicknessM()};
    }

    /**
     * Closer than this to the steady temperature of a stage without ramps, the part is taken as
     * settled (kelvin): a hundred thousand times finer than the 0.01 K accuracy target.
     */
    private static final double SETTLED_K = 1e-7;

    private boolean constantStage() {
        return stage.airStartK() == stage.airEndK() && stage.surroundingsStartK() == stage.surroundingsEndK();
    }

    /** Event time accuracy of the early stop, seconds; the runner places the event itself far finer. */
    private static final double EVENT_CONVERGENCE = 1e-6;

    /** Ends the integration where the runner's stop signal rises through zero. */
    private static final class StopAt implements EventHandler {
        private final StopSignal stop;

        StopAt(StopSignal stop) {
            this.stop = stop;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double time, double[] y) {
            return stop.value(Observation.uniform(y[0]));
        }

        @Override
        public Action eventOccurred(double time, double[] y, boolean increasing) {
            return increasing ? Action.STOP : Action.CONTINUE;
        }

        @Override
        public void resetState(double time, double[] y) {
        }
    }

    /** A settled part: its steady temperature from {@code start} to {@code end}. */
    private record SettledSegment(double start, double end, double kelvin, double rate) implements Segment {
        @Override
        public double[] knots() {
            return new double[] {start, end};
        }

        @Override
        public Observation at(double time) {
            return Observation.uniform(kelvin);
        }

        @Override
        public double meanRateAt(double time) {
            return rate;
        }

        @Override
        public double[] profileAt(double time) {
            return new double[] {kelvin, kelvin};
        }
    }

    /** Dense output of one call: the Commons Math step interpolators, one per accepted step. */
    private static final class LumpedSegment implements Segment {
        private final List<StepInterpolator> pieces;
        private final double[] knots;
        private final Rate rate;

        LumpedSegment(List<StepInterpolator> pieces, Rate rate) {
            this.pieces = pieces;
            this.rate = rate;
            this.knots = new double[pieces.size() + 1];
            knots[0] = pieces.get(0).getPreviousTime();
            for (int i = 0; i < pieces.size(); i++) {
                knots[i + 1] = pieces.get(i).getCurrentTime();
            }
        }

        @Override
        public double start() {
            return knots[0];
        }

        @Override
        public double end() {
            return knots[knots.length - 1];
        }

        @Override
        public double[] knots() {
            return knots.clone();
        }

        private double temperatureAt(double time) {
            StepInterpolator piece = pieces.get(pieceAt(time));
            piece.setInterpolatedTime(time);
            return piece.getInterpolatedState()[0];
        }

        /** The piece that holds {@code time}: a scan for the usual few pieces, a binary search for many. */
        private int pieceAt(double time) {
            int n = pieces.size();
            if (n <= 8) {
                int i = 0;
                while (i < n - 1 && time > knots[i + 1]) {
                    i++;
                }
                return i;
            }
            int i = java.util.Arrays.binarySearch(knots, 1, knots.length, time);
            i = i >= 0 ? i - 1 : Math.min(-i - 2, n - 1);
            return Math.max(0, i);
        }

        @Override
        public Observation at(double time) {
            return Observation.uniform(temperatureAt(time));
        }

        @Override
        public double meanRateAt(double time) {
            return rate.at(time, temperatureAt(time));
        }

        @Override
        public double[] profileAt(double time) {
            double k = temperatureAt(time);
            return new double[] {k, k};
        }
    }

    /** The right-hand side, for rates read off the dense output. */
    @FunctionalInterface
    private interface Rate {
        double at(double time, double temperatureK);
    }
}
