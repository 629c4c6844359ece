package dev.dwellwise.http;

import dev.dwellwise.job.Example;
import dev.dwellwise.thermal.Material;
import dev.dwellwise.thermal.Physics;
import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.List;

/** The read-only libraries: materials and bundled examples. */
final class LibraryRoutes {

    private final Services services;
    private final List<MaterialView> materials;

    LibraryRoutes(Services services) {
        this.services = services;
        this.materials = services.materials().all().stream().map(LibraryRoutes::view).toList();
    }

    void materials(Context ctx) {
        ctx.json(new MaterialList(materials));
    }

    void material(Context ctx) {
        String id = ctx.pathParam("id");
        ctx.json(materials.stream().filter(m -> m.id().equals(id)).findFirst()
                .orElseThrow(() -> new ApiException(ProblemType.NOT_FOUND, "no material '" + id + "'")));
    }

    void examples(Context ctx) {
        ctx.json(new ExampleList(services.examples().all()));
    }

    void example(Context ctx) {
        String id = ctx.pathParam("id");
        Example example = services.examples().find(id)
                .orElseThrow(() -> new ApiException(ProblemType.NOT_FOUND, "no example '" + id + "'"));
        ctx.json(example);
    }

    private static MaterialView view(Material m) {
        List<PropertyPoint> table = null;
        if (!m.specificHeat().isConstant() || !m.conductivity().isConstant()) {
            table = new ArrayList<>();
            for (double k : union(m.specificHeat().temperaturesK(), m.conductivity().temperaturesK())) {
                table.add(new PropertyPoint(round(Physics.toCelsius(k)), m.specificHeat().at(k), m.conductivity().at(k)));
            }
        }
        double roomK = 300;
        return new MaterialView(m.id(), m.name(), m.densityKgPerM3(), m.specificHeat().at(roomK),
                m.conductivity().at(roomK), table, m.source());
    }

    private static double[] union(double[] a, double[] b) {
        return java.util.stream.DoubleStream.concat(java.util.Arrays.stream(a), java.util.Arrays.stream(b))
                .filter(k -> k > 0).distinct().sorted().toArray();
    }

    private static double round(double c) {
        return Math.round(c * 100) / 100.0;
    }

    /** A material as {@code GET /v1/materials} lists it: the 300 K values, and the table where there is one. */
    record MaterialView(String id, String name, double densityKgPerM3, double specificHeatJPerKgK,
                        double conductivityWPerMK, List<PropertyPoint> table, String source) {
    }

    /** One temperature column of a material's table. */
    record PropertyPoint(double temperatureC, double specificHeatJPerKgK, double conductivityWPerMK) {
    }

    record MaterialList(List<MaterialView> materials) {
    }

    record ExampleList(List<Example> examples) {
    }
}
