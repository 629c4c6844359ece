package dev.dwellwise.thermal;

import java.util.List;
import java.util.Optional;

/**
 * The bundled thermophysical property library. Density is taken at 300 K; specific heat and
 * conductivity are tabulated against temperature where the handbook gives a column for it, and
 * interpolated linearly between its columns (see {@link PropertyCurve}).
 *
 * <p>Sources are named per entry. Values marked "from memory" are the handbook rows as the team
 * recalls them, internally consistent (alpha = k / rho c), and awaiting a check against the book.
 */
public final class MaterialLibrary {

    private static final String INCROPERA_F = "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, "
            + "Appendix A, Table A.1 (300 K row and the 400/600/800 K columns)";
    private static final String INCROPERA_M = INCROPERA_F + "; values from memory, not yet checked against the book";

    private final List<Material> materials;

    private MaterialLibrary(List<Material> materials) {
        this.materials = List.copyOf(materials);
    }

    /** The bundled library. */
    public static MaterialLibrary bundled() {
        return new MaterialLibrary(List.of(
                tabulated("aluminium-pure", "Aluminium, pure", 2702,
                        new double[] {300, 400, 600, 800}, new double[] {903, 949, 1033, 1146},
                        new double[] {237, 240, 231, 218}, INCROPERA_F),
                tabulated("aluminium-2024-t6", "Aluminium alloy 2024-T6 (4.5 Cu, 1.5 Mg, 0.6 Mn)", 2770,
                        new double[] {300, 400, 600}, new double[] {875, 925, 1042},
                        new double[] {177, 186, 186}, INCROPERA_F),
                Material.constant("aluminium-6061-t6", "Aluminium alloy 6061-T6", 2700, 896, 167,
                        "Aluminum Association typical values at 25 °C, as quoted on manufacturers' data sheets"),
                tabulated("aluminium-195-cast", "Aluminium alloy 195, cast (4.5 % Cu)", 2790,
                        new double[] {300, 400, 600}, new double[] {883, 883, 883},
                        new double[] {168, 174, 185},
                        INCROPERA_F + " (specific heat given at 300 K only: held constant)"),
                tabulated("copper-pure", "Copper, pure", 8933,
                        new double[] {300, 400, 600}, new double[] {385, 397, 417},
                        new double[] {401, 393, 379}, INCROPERA_F),
                tabulated("iron-pure", "Iron, pure", 7870,
                        new double[] {300, 600}, new double[] {447, 574}, new double[] {80.2, 54.7},
                        "Kutz (ed.), Mechanical Engineers' Handbook, Vol. 4, Table 1"),
                tabulated("steel-plain-carbon", "Plain carbon steel (Mn ≤ 1 %, Si ≤ 0.1 %)", 7854,
                        new double[] {300, 400, 600, 800, 1000}, new double[] {434, 487, 559, 685, 1169},
                        new double[] {60.5, 56.7, 48.0, 39.2, 30.0}, INCROPERA_M),
                tabulated("steel-1010", "Carbon steel AISI 1010", 7832,
                        new double[] {300, 400, 600, 800, 1000}, new double[] {434, 487, 559, 685, 1168},
                        new double[] {63.9, 58.7, 48.8, 39.2, 31.3}, INCROPERA_M),
                tabulated("stainless-304", "Stainless steel AISI 304", 7900,
                        new double[] {300, 400, 600, 800, 1000}, new double[] {477, 515, 557, 582, 611},
                        new double[] {14.9, 16.6, 19.8, 22.6, 25.4}, INCROPERA_M),
                Material.constant("cast-iron-grey", "Grey cast iron, ASTM A48 class 20", 7200, 450, 46,
                        "makeitfrom.com grey iron data (ASTM A48 class 20); conductivity of grey iron varies "
                                + "with graphite form and matrix")));
    }

    private static Material tabulated(String id, String name, double density, double[] kelvin,
                                      double[] specificHeat, double[] conductivity, String source) {
        return new Material(id, name, density, PropertyCurve.table(kelvin, specificHeat),
                PropertyCurve.table(kelvin, conductivity), source);
    }

    public List<Material> all() {
        return materials;
    }

    public Optional<Material> find(String id) {
        return materials.stream().filter(m -> m.id().equals(id)).findFirst();
    }
}
