package org.shapetrail.cli;

import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.concurrent.Callable;
import org.shapetrail.OutputFiles;
import org.shapetrail.exchange.Exporter;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.store.Database;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code export trials|visits|squads --out FILE}: CSV for spreadsheets and statistics software. */
@Command(name = "export", mixinStandardHelpOptions = true)
final class ExportCommand implements Callable<Integer> {
    enum What { trials, visits, squads }

    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "WHAT", descriptionKey = "shapetrail.export.what")
    What what;

    @Option(names = "--out", required = true, paramLabel = "FILE")
    Path out;

    @picocli.CommandLine.Mixin
    OverwriteOption overwrite;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        int[] rows = new int[1];
        OutputFiles.refuseExisting(java.util.List.of(out), overwrite.overwrite, OverwriteOption.how());
        try (Database d = db.open()) {
            Academy a = Academy.load(d);
            OutputFiles.writeWhole(out, stream -> {
                Writer w = new java.io.BufferedWriter(new java.io.OutputStreamWriter(stream, StandardCharsets.UTF_8));
                rows[0] = switch (what) {
                    case trials -> Exporter.trials(a, w);
                    case visits -> Exporter.visits(HistoryBuilder.of(a, AnalysisSettings.standard()), w);
                    case squads -> Exporter.squads(HistoryBuilder.of(a, AnalysisSettings.standard()), LocalDate.now(), w);
                };
                w.flush();
            });
        }
        spec.commandLine().getOut().println(org.shapetrail.i18n.Messages.tr("cli.export.wrote", rows[0], out));
        return 0;
    }
}
