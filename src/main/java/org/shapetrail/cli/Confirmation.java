package org.shapetrail.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

/** Asks a person to type a word before something that cannot be undone. */
final class Confirmation {
    private Confirmation() {
    }

    /** True when the person typed {@code word} (case-insensitive) at the prompt; false on anything else or EOF. */
    static boolean ask(PrintWriter out, String question, String word) {
        out.print(question + " " + org.shapetrail.i18n.Messages.tr("cli.confirm", word));
        out.flush();
        try {
            String line = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8)).readLine();
            return line != null && line.strip().equalsIgnoreCase(word);
        } catch (IOException e) {
            return false;
        }
    }
}
