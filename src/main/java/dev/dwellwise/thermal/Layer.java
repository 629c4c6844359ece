package dev.dwellwise.thermal;

/** One layer of a wall: a material and its thickness in metres. */
public record Layer(Material material, double thicknessM) {
}
