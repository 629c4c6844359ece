package dev.dwellwise.thermal;

import java.util.Comparator;

/**
 * Chooses the back end for a problem. {@code auto} first solves the lumped model (cheap) and keeps
 * it where every stage's Biot number, radiation included, is below {@link #BIOT_LIMIT}; otherwise
 * it solves the slab model. A forced {@code lumped} on a part beyond that limit still runs, and the
 * slab model is solved beside it to say how far apart the surface and core really are. The runs of
 * one selection share one wall-clock deadline.
 */
public final class ModelSelector {

    /** The usual criterion for a uniform temperature inside the part. */
    public static final double BIOT_LIMIT = 0.1;

    private final ThermalModel lumped;
    private final ThermalModel slab;

    public ModelSelector(ThermalModel lumped, ThermalModel slab) {
        this.lumped = lumped;
        this.slab = slab;
    }

    /** The same selector with another slab back end (a job's own resolution). */
    public ModelSelector withSlab(ThermalModel otherSlab) {
        return new ModelSelector(lumped, otherSlab);
    }

    /**
     * The outcome of a selection.
     *
     * @param history              the history of the model used
     * @param model                the model used
     * @param requested            {@code auto}, {@code lumped} or {@code slab}
     * @param reason               why this model, with the number that decided it
     * @param lumpedBeyondValidity a forced lumped model on a part with Bi >= 0.1
     * @param throughThicknessSpreadK the largest hottest-minus-coldest difference inside the part over the
     *                             history, from the slab model; NaN where the slab model was not solved
     */
    public record Selection(ThermalHistory history, ThermalModel model, String requested, String reason,
                            boolean lumpedBeyondValidity, double throughThicknessSpreadK) {
    }

    public Selection solve(ThermalProblem problem, String requested) {
        Deadline deadline = Deadline.startingNow(problem.budget());
        switch (requested) {
            case "lumped" -> {
                ThermalHistory history = StageRunner.run(problem, lumped, deadline);
                double bi = history.largestBiotNumber();
                boolean beyond = bi >= BIOT_LIMIT;
                double spread = beyond ? StageRunner.run(problem, slab, deadline).largestSpreadK() : Double.NaN;
                return new Selection(history, lumped, requested, "lumped model requested; " + decided(history)
                        + (beyond ? " >= " : " < ") + BIOT_LIMIT, beyond, spread);
            }
            case "slab" -> {
                ThermalHistory history = StageRunner.run(problem, slab, deadline);
                return new Selection(history, slab, requested, "slab conduction model requested", false,
                        history.largestSpreadK());
            }
            default -> {
                ThermalHistory history = StageRunner.run(problem, lumped, deadline);
                double bi = history.largestBiotNumber();
                if (bi < BIOT_LIMIT) {
                    return new Selection(history, lumped, requested, decided(history) + " < " + BIOT_LIMIT, false,
                            Double.NaN);
                }
                ThermalHistory slabHistory = StageRunner.run(problem, slab, deadline);
                // the number that decided comes from the lumped trial; the stages report the slab's own
                return new Selection(slabHistory, slab, requested, "lumped trial: " + decided(history) + " >= "
                        + BIOT_LIMIT + ": through-thickness conduction", false, slabHistory.largestSpreadK());
            }
        }
    }

    /** "largest Biot number 0.35 (stage 'bake')", from the lumped history that decided. */
    private static String decided(ThermalHistory history) {
        StageOutcome worst = history.stageWith(Comparator.comparingDouble(StageOutcome::biotNumber));
        return "largest Biot number " + format(worst.biotNumber()) + " (stage '" + worst.conditions().name() + "')";
    }

    /** Four significant digits, locale-independent. */
    public static String format(double value) {
        return DecimalText.significant(value, 4);
    }
}
