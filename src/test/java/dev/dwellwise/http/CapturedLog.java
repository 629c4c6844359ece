package dev.dwellwise.http;

import ch.qos.logback.classic.Level;
import ch.qos.logback.classic.Logger;
import ch.qos.logback.classic.spi.ILoggingEvent;
import ch.qos.logback.core.AppenderBase;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.TimeUnit;
import org.slf4j.LoggerFactory;

/** Records what one logger writes (at INFO and above) while a test runs, with each event's MDC. */
final class CapturedLog extends AppenderBase<ILoggingEvent> implements AutoCloseable {

    private final ConcurrentLinkedQueue<ILoggingEvent> events = new ConcurrentLinkedQueue<>();
    private final Logger logger;
    private final Level previous;

    private CapturedLog(String name) {
        this.logger = (Logger) LoggerFactory.getLogger(name);
        this.previous = logger.getLevel();
    }

    static CapturedLog of(String name) {
        CapturedLog log = new CapturedLog(name);
        log.setContext(log.logger.getLoggerContext());
        log.start();
        log.logger.setLevel(Level.INFO);
        log.logger.addAppender(log);
        return log;
    }

    @Override
    protected void append(ILoggingEvent event) {
        event.prepareForDeferredProcessing();
        events.add(event);
    }

    /**
     * The lines logged under a request id, after waiting (bounded) for the first and then a moment
     * for any more: an access line is written when Jetty completes the request, which can be a
     * moment after the client has read the answer.
     */
    List<String> linesOf(String requestId) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(Http.TIMEOUT_MILLIS);
        while (messagesOf(requestId).isEmpty() && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        Thread.sleep(50);
        return messagesOf(requestId);
    }

    private List<String> messagesOf(String requestId) {
        return events.stream().filter(e -> requestId.equals(e.getMDCPropertyMap().get(RequestIds.MDC_KEY)))
                .map(ILoggingEvent::getFormattedMessage).toList();
    }

    /** The request ids in the MDC of the events logged so far, in order. */
    List<String> requestIds() {
        return events.stream().map(e -> e.getMDCPropertyMap().get(RequestIds.MDC_KEY)).toList();
    }

    /** The request id in the MDC (null where there was none) of each event whose message contains the text. */
    List<String> requestIdsOfLinesContaining(String text) {
        return events.stream().filter(e -> e.getFormattedMessage().contains(text))
                .map(e -> e.getMDCPropertyMap().get(RequestIds.MDC_KEY)).toList();
    }

    List<String> messages() {
        return events.stream().map(ILoggingEvent::getFormattedMessage).toList();
    }

    @Override
    public void close() {
        logger.detachAppender(this);
        logger.setLevel(previous);
        stop();
    }
}
