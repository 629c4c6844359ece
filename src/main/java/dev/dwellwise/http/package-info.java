/**
 * The HTTP face of the service on Javalin 7: routes, content negotiation, RFC 9457 problem
 * details, and the wire JSON mapper. Handlers are thin: parse, call the core, write the answer.
 */
package dev.dwellwise.http;
