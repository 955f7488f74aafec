package org.shapetrail.cli;

import picocli.CommandLine.Option;

/** The {@code --format text|csv} option shared by the report commands. */
final class FormatOption {
    @Option(names = "--format", defaultValue = "text",
            converter = FormatConverter.class)
    OutputFormat format = OutputFormat.TEXT;
}
