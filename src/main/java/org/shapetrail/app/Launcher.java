package org.shapetrail.app;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import javafx.application.Application;
import org.shapetrail.cli.ShapetrailCli;
import org.shapetrail.store.DataFolder;
import org.shapetrail.store.NativeLibraryCache;

/**
 * Entry point of the jar: with a command (e.g. {@code rate FILE.csv}) it runs the command line, otherwise
 * it opens the desktop window. A plain class, not an {@code Application}, so that the jar starts on the
 * class path without "JavaFX runtime components are missing".
 */
public final class Launcher {
    private Launcher() {
    }

    public static void main(String[] args) {
        NativeLibraryCache.use(DataFolder.folder(System.getenv(), System.getProperty("user.home"),
                System.getProperty("os.name")));
        if (ShapetrailCli.wantsCommandLine(args)) {
            PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, StandardCharsets.UTF_8));
            PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, StandardCharsets.UTF_8));
            System.exit(ShapetrailCli.execute(args, out, err));
        }
        ShapetrailApp.preload(ShapetrailApp.chooseStart(java.util.List.of(args)));
        Application.launch(ShapetrailApp.class, args);
    }
}
