package dev.dwellwise.cure;

import java.util.Objects;

/**
 * The cure figures at the coldest and at the hottest point of the part (equal for the lumped
 * model). Under-cure (the minimums) is judged at the coldest point, over-bake (the maximums of the
 * cure window) at the hottest; the caller picks.
 *
 * @param coldest figures along the coldest point's history
 * @param hottest figures along the hottest point's history
 */
public record CureResult(CureFigures coldest, CureFigures hottest) {

    public CureResult {
        Objects.requireNonNull(coldest, "coldest");
        Objects.requireNonNull(hottest, "hottest");
    }
}
