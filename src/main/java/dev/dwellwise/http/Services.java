package dev.dwellwise.http;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.dwellwise.cure.CureBudget;
import dev.dwellwise.job.ExampleLibrary;
import dev.dwellwise.job.JobLimits;
import dev.dwellwise.job.WireJson;
import dev.dwellwise.report.Simulator;
import dev.dwellwise.thermal.ComputeBudget;
import dev.dwellwise.thermal.LumpedModel;
import dev.dwellwise.thermal.MaterialLibrary;
import dev.dwellwise.thermal.ModelSelector;
import dev.dwellwise.thermal.SlabModel;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/** The core objects the routes call, built once per app. All are immutable and thread-safe. */
public record Services(Simulator simulator, MaterialLibrary materials, ExampleLibrary examples,
                       ObjectMapper mapper, String version, byte[] openApi) {

    public Services {
        openApi = openApi.clone();
    }

    /** The bundled libraries with the default compute budget. */
    public static Services bundled() {
        return bundled(ServiceConfig.defaults());
    }

    /** The bundled libraries, the solver's wall-clock budget from the configuration. */
    public static Services bundled(ServiceConfig config) {
        ObjectMapper mapper = WireJson.create();
        MaterialLibrary materials = MaterialLibrary.bundled();
        String version = readVersion();
        ModelSelector selector = new ModelSelector(new LumpedModel(), new SlabModel());
        ComputeBudget budget = ComputeBudget.standard().withMaxMillis(config.computeBudgetMillis());
        Simulator simulator = new Simulator(materials, selector, JobLimits.standard(), budget,
                CureBudget.standard(), "dwellwise " + version);
        return new Services(simulator, materials, ExampleLibrary.bundled(mapper), mapper, version,
                resource("/openapi/dwellwise.yaml"));
    }

    /** The build's version, from the filtered {@code dwellwise/version.properties}. */
    static String readVersion() {
        Properties p = new Properties();
        try (InputStream in = Services.class.getResourceAsStream("/dwellwise/version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p.getProperty("version", "0.0.0-dev");
    }

    private static byte[] resource(String name) {
        try (InputStream in = Services.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public byte[] openApi() {
        return openApi.clone();
    }
}
