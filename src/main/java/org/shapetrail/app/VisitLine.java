package org.shapetrail.app;

/** One row of a person's visit history table, formatted for reading. */
public record VisitLine(long visitId, String date, String age, String measurer, String context, String stature,
                        String mass, String rating, String category, String change, String verdict) {
}
