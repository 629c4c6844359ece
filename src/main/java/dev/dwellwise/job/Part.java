package dev.dwellwise.job;

import java.util.List;

/**
 * The part. Either {@code material} with {@code thicknessMm}, or {@code layers} (front face first).
 *
 * @param material             a library id or a custom material
 * @param thicknessMm          thickness, mm
 * @param layers               a layered wall instead of material + thickness
 * @param exposedFaces         1 (back face insulated) or 2 (default)
 * @param emissivity           total emissivity of the exposed surface, 0..1 (required)
 * @param initialTemperatureC  uniform starting temperature, °C (required)
 */
public record Part(MaterialRef material, Double thicknessMm, List<LayerSpec> layers, Integer exposedFaces,
                   Double emissivity, Double initialTemperatureC) {

    public static final int DEFAULT_EXPOSED_FACES = 2;

    public Part {
        layers = WireLists.copy(layers);
    }

    Part withDefaults() {
        return new Part(material, thicknessMm, layers,
                exposedFaces == null ? DEFAULT_EXPOSED_FACES : exposedFaces, emissivity, initialTemperatureC);
    }
}
