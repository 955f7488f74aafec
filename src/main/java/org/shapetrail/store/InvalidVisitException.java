package org.shapetrail.store;

import java.util.List;
import org.shapetrail.ShapetrailException;
import org.shapetrail.measure.Problem;

/** A visit refused before anything was written; carries every reason. */
public final class InvalidVisitException extends ShapetrailException {
    private final List<Problem> problems;

    public InvalidVisitException(List<Problem> problems) {
        super(org.shapetrail.i18n.Messages.tr("visit.notSaved", String.join(" ", problems.stream().map(Problem::message)
                .toList())));
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }
}
