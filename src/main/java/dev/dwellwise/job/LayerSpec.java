package dev.dwellwise.job;

/** One layer of a wall: a material and its thickness in mm. */
public record LayerSpec(MaterialRef material, Double thicknessMm) {
}
