package dev.dwellwise.thermal;

/**
 * A solid's thermophysical properties.
 *
 * @param id            library id, or {@code "custom"} for one given in the job
 * @param name          a name a person reads
 * @param densityKgPerM3 density, kg/m³ (taken as constant: thermal expansion is neglected)
 * @param specificHeat  specific heat, J/(kg·K), against temperature
 * @param conductivity  thermal conductivity, W/(m·K), against temperature
 * @param source        where the values come from
 */
public record Material(String id, String name, double densityKgPerM3, PropertyCurve specificHeat,
                       PropertyCurve conductivity, String source) {

    public static Material constant(String id, String name, double density, double specificHeat,
                                    double conductivity, String source) {
        return new Material(id, name, density, PropertyCurve.constant(specificHeat),
                PropertyCurve.constant(conductivity), source);
    }

    /** Volumetric heat capacity rho·c at a temperature, J/(m³·K). */
    public double volumetricHeatCapacity(double temperatureK) {
        return densityKgPerM3 * specificHeat.at(temperatureK);
    }
}
