package dev.dwellwise.http;

import static org.hamcrest.Matchers.equalTo;

import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The wall-clock budget per solve. The long job needs a second or more of computing and stays inside
 * the step and evaluation limits: without the wall-clock budget it would answer 200.
 */
@Timeout(20)
class ComputeBudgetTest {

    private static RunningService service;

    @BeforeAll
    static void start() {
        service = RunningService.start(Map.of(ServiceConfig.COMPUTE_BUDGET_MS, "100"));
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    @Test
    void aJobThatRunsPastTheBudgetIsStoppedWithAComputeLimitProblem() {
        Http.given(service).contentType("application/json").body(Workloads.LONG_SOLVE).post("/v1/simulations").then()
                .statusCode(422)
                .contentType("application/problem+json")
                .body("type", equalTo(ProblemType.COMPUTE_LIMIT.uri()))
                .body("errors[0].field", equalTo("stages"));
    }
}
