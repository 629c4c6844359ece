package dev.dwellwise.thermal;

/** A back end: a way to compute a part's temperature history. Implementations are stateless. */
public interface ThermalModel {

    /** The model's wire name: {@code lumped} or {@code slab}. */
    String name();

    /** A short description of the method, for the result's provenance. */
    String method();

    /** The relative tolerance of its error control. */
    double tolerance();

    /** A fresh stepper for one solve of the part, starting at time 0 from its initial temperature. */
    Stepper newStepper(ThermalPart part, ComputeBudget budget);
}
