package dev.dwellwise.http;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Content negotiation as RFC 9110, section 12.5.1 describes it, and what a broken header gets. */
class MediaTypesTest {

    private static final List<String> OFFERED = List.of(MediaTypes.JSON, MediaTypes.CSV, MediaTypes.SVG);

    @Test
    void theMostSpecificRangeDecidesAType() {
        assertEquals(MediaTypes.CSV, MediaTypes.choose("*/*;q=0.1, text/csv", OFFERED));
        assertEquals(MediaTypes.JSON, MediaTypes.choose("text/*;q=0.2, */*;q=0.5", OFFERED));
        assertNull(MediaTypes.choose("*/*;q=0", OFFERED));
    }

    @Test
    void theWeightsNameIsReadInAnyCase() {
        // RFC 9110, 12.4.2: parameter names are case-insensitive
        assertEquals(MediaTypes.CSV, MediaTypes.choose("application/json;Q=0.1, text/csv", OFFERED));
    }

    @Test
    void aWeightOutsideZeroToOneCountsAsTheNearerEnd() {
        assertEquals(MediaTypes.JSON, MediaTypes.choose("text/csv;q=2, application/json", OFFERED));
        assertEquals(MediaTypes.JSON, MediaTypes.choose("text/csv;q=Infinity, application/json", OFFERED));
        assertNull(MediaTypes.choose("application/json;q=-1", OFFERED));
        assertNull(MediaTypes.choose("application/json;q=NaN", OFFERED));
    }

    @Test
    void emptyRangesAndParametersAreSkippedNotAnError() {
        assertNull(MediaTypes.choose(";", OFFERED));
        assertNull(MediaTypes.choose(" ; ", OFFERED));
        assertNull(MediaTypes.choose(",", OFFERED));
        assertEquals(MediaTypes.JSON, MediaTypes.choose("application/json, ;", OFFERED));
        assertFalse(MediaTypes.isJson(";"));
        assertFalse(MediaTypes.isJson(""));
        assertTrue(MediaTypes.isJson("Application/JSON ; charset=utf-8"));
        assertTrue(MediaTypes.isJson("application/merge-patch+json"));
    }
}
