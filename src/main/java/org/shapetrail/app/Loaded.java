package org.shapetrail.app;

import java.nio.file.Path;
import java.util.Map;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;

/** A file as the workbench holds it once read: its analyses and every person's computed history. */
public record Loaded(Path file, HistoryBuilder builder, Map<Long, PersonHistory> histories) {
}
