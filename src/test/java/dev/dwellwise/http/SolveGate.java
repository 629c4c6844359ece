package dev.dwellwise.http;

import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.report.Simulator;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.HookedModel;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.SlabModel;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/**
 * Holds solves inside the solver until released, so a test can have requests in flight for as
 * long as it needs without sleeping: each solve counts itself in, then waits for the gate to open.
 * The wait is bounded, so a test that forgets to open the gate fails instead of hanging. The hold
 * is inside the solve, after its wall-clock deadline has started, so it counts against the compute
 * budget: hold for less than the budget, or expect the TIME limit.
 */
public final class SolveGate {

    static final long MAX_HOLD_SECONDS = 10;

    private final CountDownLatch open = new CountDownLatch(1);
    private final CountDownLatch entered;

    public SolveGate(int expectedSolves) {
        this.entered = new CountDownLatch(expectedSolves);
    }

    /** The bundled services with a lumped model that waits at this gate. */
    public Services services(ServiceConfig config) {
        Services bundled = Services.bundled(config);
        ModelSelector selector = new ModelSelector(new HookedModel(new LumpedModel(), this::hold), new SlabModel());
        Simulator simulator = new Simulator(bundled.materials(), selector, JobLimits.standard(),
                ComputeBudget.standard().withMaxMillis(config.computeBudgetMillis()), CureBudget.standard(),
                "dwellwise test");
        return new Services(simulator, bundled.materials(), bundled.examples(), bundled.mapper(), bundled.version(),
                bundled.openApi());
    }

    /** Waits until the expected number of solves are held at the gate. */
    public boolean awaitEntered() throws InterruptedException {
        return entered.await(MAX_HOLD_SECONDS, TimeUnit.SECONDS);
    }

    public void open() {
        open.countDown();
    }

    /** Counts a solve in, then waits for the gate (bounded). */
    private void hold() {
        entered.countDown();
        try {
            if (!open.await(MAX_HOLD_SECONDS, TimeUnit.SECONDS)) {
                throw new IllegalStateException("the test never opened the gate");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted at the gate", e);
        }
    }
}
