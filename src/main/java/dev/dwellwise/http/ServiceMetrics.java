package dev.dwellwise.http;

import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.binder.jetty.JettyServerThreadPoolMetrics;
import io.micrometer.core.instrument.binder.jvm.ClassLoaderMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmGcMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmMemoryMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmThreadMetrics;
import io.micrometer.core.instrument.binder.system.ProcessorMetrics;
import io.micrometer.core.instrument.binder.system.UptimeMetrics;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.eclipse.jetty.util.thread.ThreadPool;

/**
 * The Prometheus registry of one app: HTTP requests by route template and status with latency
 * buckets, the JVM (memory, GC, threads, class loading), the process (CPU, uptime) and the HTTP
 * thread pool. The solver and admission meters register themselves into {@link #registry()}.
 */
final class ServiceMetrics implements AutoCloseable {

    /** Prometheus text exposition format 0.0.4, what every Prometheus version scrapes. */
    static final String CONTENT_TYPE = "text/plain; version=0.0.4; charset=utf-8";
    /** The route tag of a request that matched no route: never the raw path, which is unbounded. */
    static final String UNMATCHED = "unmatched";
    /** The method tag of a method outside RFC 9110's and PATCH: a client may invent any number of them. */
    static final String OTHER_METHOD = "other";
    private static final Set<String> METHODS = Set.of("GET", "HEAD", "POST", "PUT", "DELETE", "CONNECT", "OPTIONS",
            "TRACE", "PATCH");
    /** Histogram buckets from a health probe (sub-millisecond) to a solve near its budget. */
    static final Duration[] LATENCY_BUCKETS = {
        Duration.ofMillis(1), Duration.ofMillis(2), Duration.ofMillis(5), Duration.ofMillis(10),
        Duration.ofMillis(25), Duration.ofMillis(50), Duration.ofMillis(100), Duration.ofMillis(250),
        Duration.ofMillis(500), Duration.ofSeconds(1), Duration.ofMillis(2500), Duration.ofSeconds(5),
        Duration.ofSeconds(10), Duration.ofSeconds(30)};

    private final PrometheusMeterRegistry registry = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);
    private final JvmGcMetrics gc = new JvmGcMetrics();
    private final LatencyTimers requestTimers = new LatencyTimers(registry, "http.server.requests",
            "HTTP requests by method, route template and status", "method", "route", "status");

    ServiceMetrics(ThreadPool httpThreads) {
        new JvmMemoryMetrics().bindTo(registry);
        gc.bindTo(registry);
        new JvmThreadMetrics().bindTo(registry);
        new ClassLoaderMetrics().bindTo(registry);
        new ProcessorMetrics().bindTo(registry);
        new UptimeMetrics().bindTo(registry);
        new JettyServerThreadPoolMetrics(httpThreads, List.of()).bindTo(registry);
    }

    MeterRegistry registry() {
        return registry;
    }

    /** The method as the metrics and the access log name it: a bounded set. */
    static String method(String method) {
        return METHODS.contains(method) ? method : OTHER_METHOD;
    }

    /** One finished request, as {@code http_server_requests_seconds}. */
    void recordRequest(String method, String route, int status, double millis) {
        requestTimers.get(method, route, Integer.toString(status))
                .record(Math.round(millis * 1_000_000), TimeUnit.NANOSECONDS);
    }

    String scrape() {
        return registry.scrape();
    }

    @Override
    public void close() {
        gc.close();
        registry.close();
    }
}
