/**
 * The HTTP face of the service on Javalin 7: routes, content negotiation, RFC 9457 problem
 * details, and the wire JSON mapper. Handlers are thin: parse, call the core, write the answer.
 *
 * <p>Around the handlers sits what production needs, each in its own class: the settings from the
 * environment ({@link dev.dwellwise.http.ServiceConfig}), request ids, security headers, CORS, the
 * bearer token, admission control in front of every solve, the Prometheus metrics, Jetty's own
 * errors as problems, and the graceful stop. The numerical packages know none of it.
 */
package dev.dwellwise.http;
