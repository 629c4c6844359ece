package dev.dwellwise.thermal;

import java.util.List;

/**
 * A computed temperature history, kelvin and seconds.
 *
 * @param modelName            the back end that computed it
 * @param stages               one outcome per stage, in order
 * @param series               the output samples
 * @param dense                the continuous history, for integrals along it
 * @param profiles             through-thickness profiles at the requested times
 * @param largestHeatingRate   largest rate of rise of the mass-mean temperature, K/s
 * @param peakK                hottest point anywhere, any time
 * @param steps                accepted steps
 * @param evaluations          right-hand-side evaluations or linear solves
 */
public record ThermalHistory(String modelName, List<StageOutcome> stages, SampledSeries series,
                             DenseHistory dense, List<Profile> profiles, double largestHeatingRate,
                             double peakK, long steps, long evaluations) {

    public ThermalHistory {
        stages = List.copyOf(stages);
        profiles = List.copyOf(profiles);
    }

    public double totalSeconds() {
        return stages.isEmpty() ? 0 : stages.get(stages.size() - 1).endSeconds();
    }

    /** Temperatures at the end of the last stage. */
    public Observation finalState() {
        return stages.get(stages.size() - 1).end();
    }

    public double largestBiotNumber() {
        return stageWith(java.util.Comparator.comparingDouble(StageOutcome::biotNumber)).biotNumber();
    }

    /**
     * The largest difference between the hottest and the coldest point inside the part at any one
     * instant, kelvin, read at every step end of the dense history (0 for the lumped model).
     */
    public double largestSpreadK() {
        double spread = 0;
        for (double t : dense.knots()) {
            Observation o = dense.at(t);
            spread = Math.max(spread, o.hottestK() - o.coldestK());
        }
        return spread;
    }

    /** The first stage that is largest by the comparator (the stage with the largest Biot number, say). */
    public StageOutcome stageWith(java.util.Comparator<StageOutcome> largestBy) {
        StageOutcome best = stages.get(0);
        for (StageOutcome s : stages) {
            if (largestBy.compare(s, best) > 0) {
                best = s;
            }
        }
        return best;
    }
}
