/**
 * Judging a computed history and writing it up: the checks and the verdict, the result records
 * (the wire format of an answer), the CSV rendering and the cautions every result carries.
 *
 * <p>Imports the job and thermal packages; knows nothing of HTTP.
 */
package dev.dwellwise.report;
