package dev.dwellwise.http;

import com.fasterxml.jackson.core.JsonProcessingException;
import dev.dwellwise.job.JobValidator;
import dev.dwellwise.job.ReleaseRequest;
import dev.dwellwise.report.ReleaseAnswer;
import io.javalin.http.Context;
import java.util.List;

/**
 * {@code POST /v1/release-checks}: the MES's call before it releases a batch. A batch id and a job
 * in; {@code release} true or false, the reasons, the checks and the input hash out, as JSON.
 */
final class ReleaseRoutes {

    private final Services services;
    private final Solver solver;
    private final JsonBodies bodies;
    private final ServiceConfig config;

    ReleaseRoutes(Services services, Solver solver, JsonBodies bodies, ServiceConfig config) {
        this.services = services;
        this.solver = solver;
        this.bodies = bodies;
        this.config = config;
    }

    void release(Context ctx) throws JsonProcessingException {
        SimulationRoutes.negotiate(ctx, List.of(MediaTypes.JSON));
        // the job's field paths in problems raised past the validator (model, compute limits) start at job.
        ctx.attribute(SimulationRoutes.JOB_PREFIX, JobValidator.RELEASE_JOB_PREFIX);
        SimulationRoutes.checkBody(ctx, config);
        ReleaseAnswer answer;
        try (AdmissionControl.Place place = solver.admit()) {
            ReleaseRequest request = bodies.read(SimulationRoutes.readBody(ctx, config), ReleaseRequest.class);
            answer = solver.release(place, request);
        }
        ctx.attribute(AccessLog.DETAIL, Solver.accessDetail(answer));
        ctx.contentType(MediaTypes.JSON).result(services.mapper().writeValueAsBytes(answer));
    }
}
