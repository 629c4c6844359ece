# syntax=docker/dockerfile:1
# dwellwise: build the shaded jar with Maven on a JDK, run it on a JRE as a non-root user.
#   docker build -t dwellwise .
#   docker run --rm -p 8080:8080 dwellwise
# Settings come from the environment (PORT, DWELLWISE_*); see k8s/configmap.yaml.

FROM maven:3.9-eclipse-temurin-17 AS build
WORKDIR /src
# The dependencies first, in their own layer: a change to the sources does not download them again.
COPY pom.xml ./
RUN mvn -B -q dependency:go-offline
COPY openapi ./openapi
COPY src ./src
# The tests run in CI before an image is built; here only the jar is made.
RUN mvn -B -q -DskipTests package

FROM eclipse-temurin:17-jre
# A fixed numeric user, so that Kubernetes can check runAsNonRoot against it.
RUN groupadd --system --gid 10001 dwellwise \
 && useradd --system --uid 10001 --gid dwellwise --no-create-home --shell /usr/sbin/nologin dwellwise
WORKDIR /app
COPY --from=build /src/target/dwellwise.jar /app/dwellwise.jar
USER 10001:10001
ENV PORT=8080
EXPOSE 8080
# Heap as a share of the container's memory limit; the rest is metaspace, thread stacks and
# buffers. The parallel collector: a solve allocates short-lived objects only, and on two cores it
# gave about a tenth more simulations per second than G1 (and than the serial collector the JVM
# would pick under 1792 MiB), for young pauses of a few milliseconds. An OutOfMemoryError exits, so
# the orchestrator restarts a clean process. Extra flags go in JAVA_TOOL_OPTIONS, but no second
# collector: the JVM refuses to start with two. The exec form
# makes java PID 1, so SIGTERM reaches the JVM's hook. src/load/run-load.sh starts the jar the same way.
ENTRYPOINT ["java", "-XX:MaxRAMPercentage=75", "-XX:+UseParallelGC", "-XX:+ExitOnOutOfMemoryError", "-jar", "/app/dwellwise.jar"]
CMD ["serve"]
