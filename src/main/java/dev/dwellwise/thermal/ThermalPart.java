package dev.dwellwise.thermal;

import java.util.List;

/**
 * The part as the solvers see it: a wall of one or more layers (front face first), exposed to the
 * oven on one face (the back face insulated) or on both.
 *
 * @param layers        front face first; one layer for a plain part
 * @param exposedFaces  1 or 2
 * @param emissivity    total hemispherical emissivity of the exposed surfaces, 0..1
 * @param initialK      uniform starting temperature, kelvin
 */
public record ThermalPart(List<Layer> layers, int exposedFaces, double emissivity, double initialK) {

    public ThermalPart {
        layers = List.copyOf(layers);
    }

    public double thicknessM() {
        double sum = 0;
        for (Layer layer : layers) {
            sum += layer.thicknessM();
        }
        return sum;
    }

    /** Conduction length of the Biot number: the thickness per exposed face (V / A). */
    public double characteristicLengthM() {
        return thicknessM() / exposedFaces;
    }

    /** Heat capacity per unit exposed-face area at a uniform temperature, J/(m²·K). */
    public double areaHeatCapacity(double temperatureK) {
        double sum = 0;
        for (Layer layer : layers) {
            sum += layer.material().volumetricHeatCapacity(temperatureK) * layer.thicknessM();
        }
        return sum;
    }

    /**
     * Conductivity for the Biot number: the thickness-weighted harmonic mean over the layers (the
     * series conductance of the wall), each layer at its lowest value over the given range.
     */
    public double effectiveConductivity(double lowK, double highK) {
        double resistance = 0;
        for (Layer layer : layers) {
            resistance += layer.thicknessM() / layer.material().conductivity().minimumOver(lowK, highK);
        }
        return thicknessM() / resistance;
    }
}
