package org.shapetrail.cli;

/** How a report command writes: aligned text for reading, or CSV for statistics software. */
enum OutputFormat {
    TEXT,
    CSV
}
