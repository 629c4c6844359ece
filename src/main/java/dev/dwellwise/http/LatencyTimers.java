package dev.dwellwise.http;

import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Tags;
import io.micrometer.core.instrument.Timer;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The timers of one latency histogram, one per combination of tag values, with the service's
 * buckets ({@link ServiceMetrics#LATENCY_BUCKETS}). A timer is looked up by a plain key: building
 * the meter id (tags, buckets) on every request cost more than recording. The tag values must come
 * from small sets (methods, route templates, statuses, outcomes), never from the request itself.
 */
final class LatencyTimers {

    private final MeterRegistry registry;
    private final String name;
    private final String description;
    private final List<String> tagKeys;
    private final Map<String, Timer> timers = new ConcurrentHashMap<>();

    LatencyTimers(MeterRegistry registry, String name, String description, String... tagKeys) {
        this.registry = registry;
        this.name = name;
        this.description = description;
        this.tagKeys = List.of(tagKeys);
    }

    /** The timer for these tag values, in the order of the tag keys. */
    Timer get(String... tagValues) {
        if (tagValues.length != tagKeys.size()) {
            throw new IllegalArgumentException(name + " takes the tags " + tagKeys);
        }
        return timers.computeIfAbsent(String.join("\u0000", tagValues), key -> register(tagValues));
    }

    private Timer register(String[] tagValues) {
        Tags tags = Tags.empty();
        for (int i = 0; i < tagValues.length; i++) {
            tags = tags.and(tagKeys.get(i), tagValues[i]);
        }
        return Timer.builder(name).description(description).tags(tags)
                .serviceLevelObjectives(ServiceMetrics.LATENCY_BUCKETS)
                .register(registry);
    }
}
