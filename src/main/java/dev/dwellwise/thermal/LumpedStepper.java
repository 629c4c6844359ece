package dev.dwellwise.thermal;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Steps the lumped balance of {@link LumpedModel} with Commons Math. The integrator drives its own
 * loop, so each {@link #advance} integrates a window of about twice the last accepted step and
 * keeps copies of the step interpolators as the dense output; the window end is a step end, so no
 * accuracy is lost at it. State: y[0] = T, kelvin.
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
    private double nextWindow;
    private long steps;
    private long evaluations;
    private LumpedSegment last;

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
        this.nextWindow = Double.NaN; // the rate may jump at a boundary: let the integrator estimate
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
        double window = Double.isNaN(nextWindow) ? limit - t : Math.min(nextWindow, limit - t);
        double end = window >= limit - t ? limit : t + window;
        List<StepInterpolator> pieces = new ArrayList<>();
        integrator.clearStepHandlers();
        integrator.addStepHandler(new StepHandler() {
            @Override
            public void init(double t0, double[] y0, double tEnd) {
            }

            @Override
            public void handleStep(StepInterpolator interpolator, boolean isLast) {
                deadline.check(); // a window can hold thousands of steps: stop inside it
                pieces.add(interpolator.copy());
            }
        });
        integrator.setInitialStepSize(Double.isNaN(nextWindow) ? -1 : window);
        integrator.setMaxEvaluations((int) Math.max(1, Math.min(Integer.MAX_VALUE,
                budget.maxEvaluations() - evaluations)));
        double[] y = {temperatureK};
        FirstOrderDifferentialEquations equations = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double time, double[] state, double[] derivative) {
                derivative[0] = rate(time, state[0]);
            }
        };
        try {
            integrator.integrate(equations, t, y, end, y);
        } catch (MaxCountExceededException e) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.EVALUATIONS,
                    "the solve needed more than " + budget.maxEvaluations() + " evaluations");
        }
        evaluations += integrator.getEvaluations();
        steps += pieces.size();
        double longest = 0;
        for (StepInterpolator piece : pieces) {
            longest = Math.max(longest, piece.getCurrentTime() - piece.getPreviousTime());
        }
        nextWindow = 2 * longest;
        last = new LumpedSegment(pieces, this::rate);
        t = end;
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

    /** Dense output of one window: the Commons Math step interpolators, one per accepted step. */
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
            int i = java.util.Arrays.binarySearch(knots, 1, knots.length, time);
            i = i >= 0 ? i - 1 : Math.min(-i - 2, pieces.size() - 1);
            StepInterpolator piece = pieces.get(Math.max(0, i));
            piece.setInterpolatedTime(time);
            return piece.getInterpolatedState()[0];
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
