package dev.dwellwise.thermal;

/**
 * A back end that runs {@code beforeEachRun} whenever a run asks it for a stepper, then hands the
 * run to {@code model}: for tests that hold a solve at a gate or make it slow to start.
 */
public record HookedModel(ThermalModel model, Runnable beforeEachRun) implements ThermalModel {

    @Override
    public String name() {
        return model.name();
    }

    @Override
    public String method() {
        return model.method();
    }

    @Override
    public double tolerance() {
        return model.tolerance();
    }

    @Override
    public Stepper newStepper(ThermalPart part, ComputeBudget budget, Deadline deadline) {
        beforeEachRun.run();
        return model.newStepper(part, budget, deadline);
    }
}
