package dev.dwellwise.thermal;

/** A back end: a way to compute a part's temperature history. Implementations are stateless. */
public interface ThermalModel {

    /** The model's wire name: {@code lumped} or {@code slab}. */
    String name();

    /** A short description of the method, for the result's provenance. */
    String method();

    /** The relative tolerance of its error control. */
    double tolerance();

    /**
     * A fresh stepper for one run of the part, starting at time 0 from its initial temperature, that
     * stops with the TIME limit once the solve's {@code deadline} has passed.
     */
    Stepper newStepper(ThermalPart part, ComputeBudget budget, Deadline deadline);

    /**
     * As above, for a run that is a whole solve: the budget's wall clock starts now. A wrapper
     * overrides the three-argument form and passes the deadline on.
     */
    default Stepper newStepper(ThermalPart part, ComputeBudget budget) {
        return newStepper(part, budget, Deadline.startingNow(budget));
    }
}
