package dev.dwellwise.job;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** Defensive copies of lists from the wire, which may hold nulls that the validator reports. */
final class WireLists {

    private WireLists() {
    }

    static <T> List<T> copy(List<T> list) {
        return list == null ? null : Collections.unmodifiableList(new ArrayList<>(list));
    }
}
