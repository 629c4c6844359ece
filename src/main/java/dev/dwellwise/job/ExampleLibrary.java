package dev.dwellwise.job;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The bundled example jobs: {@code examples/index.json} lists id, title and description; each job
 * is a plain job file {@code examples/<id>.json}, so it can be posted as it is
 * ({@code curl --data @src/main/resources/examples/<id>.json ...}).
 */
public final class ExampleLibrary {

    private final List<Example> examples;

    private ExampleLibrary(List<Example> examples) {
        this.examples = List.copyOf(examples);
    }

    /** An entry of the index: an example without its job. */
    record Entry(String id, String title, String description) {
    }

    public static ExampleLibrary bundled(ObjectMapper wireMapper) {
        List<Example> out = new ArrayList<>();
        for (Entry entry : read(wireMapper, "/examples/index.json", Entry[].class)) {
            Job job = read(wireMapper, "/examples/" + entry.id() + ".json", Job.class);
            out.add(new Example(entry.id(), entry.title(), entry.description(), job));
        }
        return new ExampleLibrary(out);
    }

    private static <T> T read(ObjectMapper mapper, String resource, Class<T> type) {
        try (InputStream in = ExampleLibrary.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing bundled resource " + resource);
            }
            return mapper.readValue(in, type);
        } catch (IOException e) {
            throw new UncheckedIOException("unreadable bundled resource " + resource, e);
        }
    }

    public List<Example> all() {
        return examples;
    }

    public Optional<Example> find(String id) {
        return examples.stream().filter(e -> e.id().equals(id)).findFirst();
    }
}
