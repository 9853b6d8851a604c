package ionmark.notebook.api;

/**
 * A pH range in which one structure of an entry is at least 99 % neutral (extractable) while another is at
 * least 99 % charged (stays in water).
 *
 * @param extracted the words of the structure that goes to the organic phase
 * @param retained  the words of the structure that stays in the aqueous phase
 * @param from      low end of the range, pH
 * @param to        high end of the range, pH
 */
public record Separation(String extracted, String retained, double from, double to) {
}
