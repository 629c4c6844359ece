package dev.dwellwise.job;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A material as the job names it: a library id ({@code "steel-1010"}) or a custom object with
 * density, specific heat and conductivity, each constant or tabulated against temperature.
 *
 * @param id                   the library id, or null for a custom material
 * @param name                 a custom material's name (optional)
 * @param densityKgPerM3       custom density
 * @param specificHeatJPerKgK  custom constant specific heat
 * @param conductivityWPerMK   custom constant conductivity
 * @param specificHeatTable    custom specific heat against temperature, instead of the constant
 * @param conductivityTable    custom conductivity against temperature, instead of the constant
 */
public record MaterialRef(String id, String name, Double densityKgPerM3, Double specificHeatJPerKgK,
                          Double conductivityWPerMK, List<SpecificHeatPoint> specificHeatTable,
                          List<ConductivityPoint> conductivityTable) {

    public MaterialRef {
        specificHeatTable = WireLists.copy(specificHeatTable);
        conductivityTable = WireLists.copy(conductivityTable);
    }

    /** A library material, written in a job as a plain string. */
    @JsonCreator(mode = JsonCreator.Mode.DELEGATING)
    public static MaterialRef ofId(String id) {
        return new MaterialRef(id, null, null, null, null, null, null);
    }

    /** A custom material, written in a job as an object. */
    @JsonCreator(mode = JsonCreator.Mode.PROPERTIES)
    public static MaterialRef custom(@JsonProperty("name") String name,
                                     @JsonProperty("densityKgPerM3") Double densityKgPerM3,
                                     @JsonProperty("specificHeatJPerKgK") Double specificHeatJPerKgK,
                                     @JsonProperty("conductivityWPerMK") Double conductivityWPerMK,
                                     @JsonProperty("specificHeatTable") List<SpecificHeatPoint> specificHeatTable,
                                     @JsonProperty("conductivityTable") List<ConductivityPoint> conductivityTable) {
        return new MaterialRef(null, name, densityKgPerM3, specificHeatJPerKgK, conductivityWPerMK,
                specificHeatTable, conductivityTable);
    }

    public boolean isLibrary() {
        return id != null;
    }

    /** Written back as the client wrote it: the id string, or the custom object without empty fields. */
    @JsonValue
    public Object wireForm() {
        if (id != null) {
            return id;
        }
        Map<String, Object> out = new TreeMap<>();
        putIfPresent(out, "name", name);
        putIfPresent(out, "densityKgPerM3", densityKgPerM3);
        putIfPresent(out, "specificHeatJPerKgK", specificHeatJPerKgK);
        putIfPresent(out, "conductivityWPerMK", conductivityWPerMK);
        putIfPresent(out, "specificHeatTable", specificHeatTable);
        putIfPresent(out, "conductivityTable", conductivityTable);
        return out;
    }

    private static void putIfPresent(Map<String, Object> out, String key, Object value) {
        if (value != null) {
            out.put(key, value);
        }
    }

    /** One point of a specific heat table. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record SpecificHeatPoint(Double temperatureC, Double specificHeatJPerKgK) {
    }

    /** One point of a conductivity table. */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record ConductivityPoint(Double temperatureC, Double conductivityWPerMK) {
    }
}
