package dev.dwellwise.http;

import io.javalin.Javalin;
import java.util.HashMap;
import java.util.Map;

/** A started app on a free loopback port, with the settings of the given environment. */
final class RunningService implements AutoCloseable {

    private final Javalin app;
    /** Read once at start: once a stop has closed the listener, Javalin reports a negative port. */
    private final int port;
    private boolean stopped;

    private RunningService(Javalin app) {
        this.app = app;
        this.port = app.port();
    }

    static RunningService start(Map<String, String> env) {
        return start(env, Services.bundled(config(env)));
    }

    static RunningService start(Map<String, String> env, Services services) {
        return new RunningService(App.create(config(env), services).start());
    }

    /** The settings of {@code env} on port 0 and the loopback interface. */
    static ServiceConfig config(Map<String, String> env) {
        Map<String, String> all = new HashMap<>(env);
        all.putIfAbsent(ServiceConfig.PORT, "0");
        all.putIfAbsent(ServiceConfig.HOST, "127.0.0.1");
        return ServiceConfig.fromEnvironment(all);
    }

    int port() {
        return port;
    }

    String url(String path) {
        return "http://127.0.0.1:" + port() + path;
    }

    /** The graceful stop, as the shutdown hook runs it. */
    void stop() {
        stopped = true;
        app.stop();
    }

    @Override
    public void close() {
        if (!stopped) {
            stop();
        }
    }
}
