package dev.dwellwise.job;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** The bundled example jobs, read once from {@code examples/*.json} on the classpath. */
public final class ExampleLibrary {

    /** The examples in the order they are listed. */
    static final List<String> IDS = List.of("powder-coat-steel-panel", "e-coat-bracket-ramped-oven",
            "aluminium-extrusion-ageing");

    private final List<Example> examples;

    private ExampleLibrary(List<Example> examples) {
        this.examples = List.copyOf(examples);
    }

    public static ExampleLibrary bundled(ObjectMapper wireMapper) {
        List<Example> out = new ArrayList<>();
        for (String id : IDS) {
            String resource = "/examples/" + id + ".json";
            try (InputStream in = ExampleLibrary.class.getResourceAsStream(resource)) {
                if (in == null) {
                    throw new IllegalStateException("missing bundled example " + resource);
                }
                Example example = wireMapper.readValue(in, Example.class);
                if (!id.equals(example.id())) {
                    throw new IllegalStateException(resource + " has id " + example.id());
                }
                out.add(example);
            } catch (IOException e) {
                throw new UncheckedIOException("unreadable bundled example " + resource, e);
            }
        }
        return new ExampleLibrary(out);
    }

    public List<Example> all() {
        return examples;
    }

    public Optional<Example> find(String id) {
        return examples.stream().filter(e -> e.id().equals(id)).findFirst();
    }
}
