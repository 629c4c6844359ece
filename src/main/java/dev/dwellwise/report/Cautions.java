package dev.dwellwise.report;

import java.util.List;

/** The cautions every answer carries: results are estimates, and hot parts and ovens hurt people. */
public final class Cautions {

    public static final List<String> ALL = List.of(
            "Estimates for planning and release decisions that the plant's own procedures confirm: verify a "
                    + "new recipe with a measured part-temperature profile (a data logger run) before relying on it.",
            "Part temperature, not air temperature, decides cure: the coating supplier's data sheet and its "
                    + "cure window govern; treat these figures as a check on it, not a replacement.",
            "Hot parts cause contact burns: judge safe handling by ISO 13732-1 contact thresholds and local "
                    + "rules, and wear heat-resistant gloves until parts are confirmed cool.",
            "Ovens that release flammable vapours fall under NFPA 86, EN 1539 and local codes (ventilation, "
                    + "purge, interlocks); defer to licensed practice for oven safety.");

    private Cautions() {
    }
}
