package dev.dwellwise.thermal;

import java.util.Locale;
import java.util.Optional;

/**
 * Chooses the back end for a problem. {@code auto} first solves the lumped model (cheap) and keeps
 * it where every stage's Biot number, radiation included, is below {@link #BIOT_LIMIT}; otherwise
 * it solves the slab model, when one is installed.
 */
public final class ModelSelector {

    /** The usual criterion for a uniform temperature inside the part. */
    public static final double BIOT_LIMIT = 0.1;

    private final ThermalModel lumped;
    private final Optional<ThermalModel> slab;

    public ModelSelector(ThermalModel lumped, Optional<ThermalModel> slab) {
        this.lumped = lumped;
        this.slab = slab;
    }

    /** The outcome of a selection: the history of the model used, and why it was chosen. */
    public record Selection(ThermalHistory history, ThermalModel model, String requested, String reason,
                            boolean lumpedBeyondValidity) {
    }

    public boolean slabAvailable() {
        return slab.isPresent();
    }

    public Selection solve(ThermalProblem problem, String requested) {
        switch (requested) {
            case "lumped" -> {
                ThermalHistory history = StageRunner.run(problem, lumped);
                double bi = history.largestBiotNumber();
                return new Selection(history, lumped, requested, "lumped model requested; largest Biot number "
                        + format(bi) + (bi < BIOT_LIMIT ? " < " : " >= ") + BIOT_LIMIT, bi >= BIOT_LIMIT);
            }
            case "slab" -> {
                ThermalModel model = slab.orElseThrow(() -> new ModelUnavailableException("slab"));
                return new Selection(StageRunner.run(problem, model), model, requested,
                        "slab conduction model requested", false);
            }
            default -> {
                ThermalHistory history = StageRunner.run(problem, lumped);
                double bi = history.largestBiotNumber();
                String decided = "largest Biot number " + format(bi) + " (stage '" + history.stageWith(java.util.Comparator.comparingDouble(StageOutcome::biotNumber)).conditions().name()
                        + "')";
                if (bi < BIOT_LIMIT) {
                    return new Selection(history, lumped, requested, decided + " < " + BIOT_LIMIT, false);
                }
                if (slab.isPresent()) {
                    return new Selection(StageRunner.run(problem, slab.get()), slab.get(), requested,
                            decided + " >= " + BIOT_LIMIT + ": through-thickness conduction", false);
                }
                return new Selection(history, lumped, requested,
                        decided + " >= " + BIOT_LIMIT + ", but no slab model is installed", true);
            }
        }
    }

    /** Four significant digits, locale-independent. */
    public static String format(double value) {
        return String.format(Locale.ROOT, "%.4g", value);
    }
}
