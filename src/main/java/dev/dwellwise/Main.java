package dev.dwellwise;

import dev.dwellwise.http.App;
import dev.dwellwise.http.ServiceConfig;
import dev.dwellwise.http.Services;
import dev.dwellwise.job.InvalidJobException;
import dev.dwellwise.job.Job;
import dev.dwellwise.job.WireJson;
import com.fasterxml.jackson.databind.JsonMappingException;
import dev.dwellwise.report.SimulationResult;
import io.javalin.Javalin;
import java.util.List;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The command line: {@code serve [--port N]} starts the service; {@code run JOB.json} prints the
 * result of one job and exits 0 on a pass verdict, 1 on a fail, 2 when the job is invalid.
 *
 * <p>{@code serve} exits 2 on a configuration error and 1 when the server cannot start. Once it
 * serves, SIGTERM (or SIGINT) runs the shutdown hook: a graceful stop of the app, then exit 0 when
 * every request in flight finished within the grace period, 1 when the stop failed.
 */
public final class Main {

    private static final Logger LOG = LoggerFactory.getLogger(Main.class);

    static final int EXIT_PASS = 0;
    static final int EXIT_FAIL = 1;
    static final int EXIT_INVALID = 2;

    private Main() {
    }

    /** Exit code meaning "keep running": the service is serving. */
    static final int SERVING = -1;

    public static void main(String[] args) {
        int code = run(args, System.out, System.err);
        if (code != SERVING) {
            System.exit(code);
        }
    }

    static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0 || "serve".equals(args[0])) {
            return serve(args, err);
        }
        if ("run".equals(args[0]) && args.length == 2) {
            return runJob(Path.of(args[1]), out, err);
        }
        err.println("usage: dwellwise serve [--port N] | dwellwise run JOB.json");
        return EXIT_INVALID;
    }

    private static int serve(String[] args, PrintStream err) {
        ServiceConfig config;
        try {
            config = ServiceConfig.fromEnvironment(System.getenv());
            for (int i = 1; i < args.length; i++) {
                if ("--port".equals(args[i]) && i + 1 < args.length) {
                    config = config.withPort(Integer.parseInt(args[++i]));
                } else {
                    err.println("unknown option " + args[i] + "; usage: dwellwise serve [--port N]");
                    return EXIT_INVALID;
                }
            }
        } catch (IllegalArgumentException e) {
            err.println("configuration error: " + e.getMessage());
            return EXIT_INVALID;
        }
        List<String> unknown = ServiceConfig.unrecognised(System.getenv());
        if (!unknown.isEmpty()) {
            LOG.warn("ignoring unknown settings {}; the service reads {}", unknown, ServiceConfig.VARIABLES);
        }
        Javalin app = App.create(config, Services.bundled(config));
        try {
            app.start();
        } catch (RuntimeException e) {
            err.println("cannot start the server: " + e.getMessage());
            return EXIT_FAIL;
        }
        LOG.info("serving on port {}: {}", app.port(), config);
        // The JVM would exit 143 after a SIGTERM; halting from the hook makes the code say whether
        // the stop was clean. No other hook is registered, so halting cuts nothing short.
        Runtime.getRuntime().addShutdownHook(new Thread(() -> Runtime.getRuntime().halt(stop(app)),
                "dwellwise-shutdown"));
        return SERVING; // main returns; Jetty's threads keep the JVM alive until a signal stops it
    }

    /** The shutdown hook's work: the graceful stop; the exit code it earns. */
    static int stop(Javalin app) {
        LOG.info("stopping: no new connections; waiting for the requests in flight");
        try {
            app.stop();
            LOG.info("stopped");
            return EXIT_PASS;
        } catch (RuntimeException e) {
            LOG.error("the stop did not complete cleanly: {}", e.getMessage());
            return EXIT_FAIL;
        } finally {
            System.out.flush();
            System.err.flush();
        }
    }

    private static int runJob(Path file, PrintStream out, PrintStream err) {
        Services services = Services.bundled();
        try {
            byte[] body = Files.readAllBytes(file);
            Job job = services.mapper().readValue(body, Job.class);
            SimulationResult result = services.simulator().simulate(job);
            out.println(services.mapper().writerWithDefaultPrettyPrinter().writeValueAsString(result));
            return result.passed() ? EXIT_PASS : EXIT_FAIL;
        } catch (InvalidJobException e) {
            e.errors().forEach(fe -> err.println(fe.field() + ": " + fe.message()));
            return EXIT_INVALID;
        } catch (JsonMappingException e) {
            err.println(WireJson.path(e.getPath()) + ": " + e.getOriginalMessage().split("\\(class")[0].trim());
            return EXIT_INVALID;
        } catch (IOException e) {
            err.println("cannot read the job: " + e.getMessage());
            return EXIT_INVALID;
        } catch (RuntimeException e) {
            err.println("the job could not be solved: " + e.getMessage());
            return EXIT_INVALID;
        }
    }
}
