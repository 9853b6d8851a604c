package ionmark.speciation.api;

/** A pH range [from, to] in which a condition holds (for example: at least 99 % neutral). */
public record Window(double from, double to) {
}
