package dev.dwellwise.job;

import java.util.List;

/**
 * A simulation job: a part, the stages it passes through, the cure it needs and the limits it is
 * judged by, the model and the output wanted.
 *
 * @param part      the part
 * @param stages    the stages in order, on one clock from 0
 * @param cure      what the coating needs to count as cured (optional)
 * @param limits    safety and quality limits (each optional)
 * @param model     {@code auto} (default), {@code lumped} or {@code slab}
 * @param slabCells finite volumes through the thickness for the slab model (optional)
 * @param output    what the result carries
 */
public record Job(Part part, List<Stage> stages, Cure cure, Limits limits, String model, Integer slabCells,
                  Output output) {

    public static final String DEFAULT_MODEL = "auto";

    public Job {
        stages = WireLists.copy(stages);
    }

    /** The job with every default filled in: the form that is hashed and solved. */
    public Job withDefaults() {
        return new Job(part.withDefaults(), stages.stream().map(Stage::withDefaults).toList(),
                cure == null ? null : cure.withDefaults(), limits == null ? Limits.NONE : limits,
                model == null ? DEFAULT_MODEL : model, slabCells, output == null ? Output.DEFAULTS : output.withDefaults());
    }

    /** The same job with other output wanted: what is computed and judged does not depend on it. */
    public Job withOutput(Output other) {
        return new Job(part, stages, cure, limits, model, slabCells, other);
    }
}
