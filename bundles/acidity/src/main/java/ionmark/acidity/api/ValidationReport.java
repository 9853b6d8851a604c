package ionmark.acidity.api;

import java.util.List;
import java.util.Optional;

/**
 * Every problem found in a table text at once, and the table when it could be read.
 *
 * @param problems errors and warnings in document order
 * @param table    the parsed table when there are no errors
 */
public record ValidationReport(List<Problem> problems, Optional<AcidityTable> table) {
    public ValidationReport {
        problems = List.copyOf(problems);
    }

    public boolean ok() {
        return problems.stream().noneMatch(p -> p.severity() == Problem.Severity.ERROR);
    }

    public List<Problem> errors() {
        return problems.stream().filter(p -> p.severity() == Problem.Severity.ERROR).toList();
    }

    public List<Problem> warnings() {
        return problems.stream().filter(p -> p.severity() == Problem.Severity.WARNING).toList();
    }
}
