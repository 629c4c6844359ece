package dev.dwellwise.thermal;

import java.util.List;

/** Small builders for the thermal tests. */
final class Parts {

    private Parts() {
    }

    /** Plain carbon steel AISI 1010 at 300 K, as REFERENCES.md section 4 quotes it (Incropera Table A.1, from memory). */
    static Material steel1010() {
        return Material.constant("steel-1010", "AISI 1010", 7832, 434, 63.9, "Incropera Table A.1 [M]");
    }

    /**
     * An invented solid with round numbers for the closed-form checks: rho 1200 kg/m3, c 1500 J/kgK,
     * k 0.6 W/mK, so alpha = 3.33e-7 m2/s and a 10 mm conduction length has L^2/alpha = 300 s.
     */
    static Material testSolid() {
        return Material.constant("test-solid", "invented test solid", 1200, 1500, 0.6, "invented for the tests");
    }

    static ThermalPart plate(Material material, double thicknessM, int faces, double emissivity, double initialC) {
        return new ThermalPart(List.of(new Layer(material, thicknessM)), faces, emissivity,
                Physics.toKelvin(initialC));
    }

    static StageConditions stage(String name, double airC, double surC, double h, EndCondition end, double bound) {
        return new StageConditions(name, Physics.toKelvin(airC), Physics.toKelvin(airC), Physics.toKelvin(surC),
                Physics.toKelvin(surC), h, end, bound);
    }

    static ThermalProblem problem(ThermalPart part, double sampleSeconds, StageConditions... stages) {
        return new ThermalProblem(part, List.of(stages), sampleSeconds, ComputeBudget.standard(), List.of());
    }
}
