package dev.dwellwise.thermal;

/**
 * Steps the lumped balance of {@link LumpedModel} with {@link ScalarDormandPrince}: each
 * {@link #advance} is one integration call, to the limit, to the step after the runner's stop
 * signal rises through zero, or to where, inside its last step, the part comes within the settle
 * band (the next call then settles it); the accepted steps' continuous extension is the dense output.
 */
final class LumpedStepper implements Stepper {

    private final ThermalPart part;
    private final ComputeBudget budget;
    private final Deadline deadline;
    private final ScalarDormandPrince integrator;
    private final double faces;
    /** C(T) = sum over the layers of rho c(T) L, J/(m²·K), as one curve: it is read at every right-hand-side call. */
    private final PropertyCurve capacity;
    private StageConditions stage;
    private double stageStart;
    private double t;
    private double temperatureK;
    private long steps;
    private Segment last;
    LumpedStepper(ThermalPart part, ComputeBudget budget, Deadline deadline) {
        this.part = part;
        this.budget = budget;
        this.deadline = deadline;
        this.faces = part.exposedFaces();
        int layers = part.layers().size();
        PropertyCurve[] specificHeats = new PropertyCurve[layers];
        double[] massPerArea = new double[layers];
        for (int i = 0; i < layers; i++) {
            Layer layer = part.layers().get(i);
            specificHeats[i] = layer.material().specificHeat();
            massPerArea[i] = layer.material().densityKgPerM3() * layer.thicknessM();
        }
        this.capacity = PropertyCurve.weightedSum(specificHeats, massPerArea);
        this.integrator = new ScalarDormandPrince(LumpedModel.ABSOLUTE_TOLERANCE, LumpedModel.RELATIVE_TOLERANCE);
        this.temperatureK = part.initialK();
    }

    /** dT/dt at time {@code time} and temperature {@code k}, K/s. */
    private double rate(double time, double k) {
        double elapsed = time - stageStart;
        double q = Physics.surfaceFlux(stage.convection(), stage.airK(elapsed), part.emissivity(),
                stage.surroundingsK(elapsed), k);
        return faces * q / capacity.at(k);
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
     * Integrates to {@code limit} in one call, or until {@code stop} rises through zero at a step
     * end (the runner then places the event on the dense output), or until the part settles.
     */
    @Override
    public Segment advance(double limit, StopSignal stop) {
        double steadyK = SettledSegment.steadyK(stage, part.emissivity(), temperatureK, stop);
        if (SettledSegment.within(temperatureK, steadyK)) {
            // settled under fixed surroundings: nothing left to integrate, and a thin part with strong
            // convection would otherwise spend the step budget on the explicit method's stability limit
            last = new SettledSegment(t, limit, steadyK, rate(limit, steadyK), 2);
            t = limit;
            temperatureK = steadyK;
            steps++;
            return last;
        }
        double[] signal = {stop.value(Observation.uniform(temperatureK))};
        ScalarDormandPrince.EndCheck ends = (time, k) -> {
            double now = stop == StopSignal.NONE ? -1 : stop.value(Observation.uniform(k));
            boolean rose = signal[0] < 0 && now >= 0;
            signal[0] = now;
            return rose || SettledSegment.within(k, steadyK);
        };
        ScalarDormandPrince.Pieces pieces = new ScalarDormandPrince.Pieces();
        double reached = integrator.integrate(this::rate, t, temperatureK, limit, ends, pieces, this::guard);
        steps += pieces.size();
        if (SettledSegment.within(pieces.lastValue(), steadyK)) {
            // the last step came within the band: end where it entered, and the next call settles
            // there, so the settling time does not depend on where that (long) step happened to end
            reached = SettledSegment.bandEntry(time -> Math.abs(pieces.valueAt(time) - steadyK),
                    pieces.lastStart(), reached, steadyK);
        }
        last = new LumpedSegment(pieces, this::rate, reached);
        temperatureK = reached < pieces.end() ? pieces.valueAt(reached) : pieces.lastValue();
        t = reached;
        return last;
    }

    /** Before every step: the step, evaluation and wall-clock budgets (one call can hold thousands of steps). */
    private void guard(long takenInThisCall) {
        if (steps + takenInThisCall >= budget.maxSteps()) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.STEPS,
                    "the solve needed more than " + budget.maxSteps() + " steps");
        }
        if (integrator.evaluations() > budget.maxEvaluations()) {
            throw new ComputeLimitExceededException(ComputeLimitExceededException.Limit.EVALUATIONS,
                    "the solve needed more than " + budget.maxEvaluations() + " evaluations");
        }
        if ((takenInThisCall & 15) == 0) {
            deadline.check();
        }
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
        return integrator.evaluations();
    }

    @Override
    public double[] profilePositionsM() {
        return new double[] {0, part.thicknessM()};
    }

    /** Dense output of one call: the accepted steps' continuous extension. */
    private static final class LumpedSegment implements Segment {
        private final ScalarDormandPrince.Pieces pieces;
        private final ScalarDormandPrince.Equation rate;
        /** The end: the last step's end, or a time inside it where the part came within the settle band. */
        private final double end;

        LumpedSegment(ScalarDormandPrince.Pieces pieces, ScalarDormandPrince.Equation rate, double end) {
            this.pieces = pieces;
            this.rate = rate;
            this.end = end;
        }

        @Override
        public double start() {
            return pieces.start();
        }

        @Override
        public double end() {
            return end;
        }

        @Override
        public double[] knots() {
            double[] knots = pieces.knots();
            knots[knots.length - 1] = end;
            return knots;
        }

        @Override
        public Observation at(double time) {
            return Observation.uniform(pieces.valueAt(time));
        }

        @Override
        public double meanRateAt(double time) {
            return rate.rate(time, pieces.valueAt(time));
        }

        @Override
        public double meanRateAt(double time, Observation at) {
            return rate.rate(time, at.meanK());
        }

        @Override
        public double[] profileAt(double time) {
            double k = pieces.valueAt(time);
            return new double[] {k, k};
        }
    }
}
