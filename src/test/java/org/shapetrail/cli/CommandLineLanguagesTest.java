package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.i18n.Messages;
import org.shapetrail.store.demo.DemoAcademy;

/** {@code --lang} on any command: help, messages and the aligned tables in Spanish or Portuguese; CSV stays as documented. */
class CommandLineLanguagesTest {
    @TempDir
    static Path dir;
    static Path file;

    @BeforeAll
    static void demo() throws Exception {
        file = dir.resolve("demo.sqlite");
        DemoAcademy.generate(file);
    }

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void theHelpIsInTheLanguageAsked() {
        // the bundles' texts (messages_es/_pt.properties), where the annotations used to hold English
        Run es = run("rate", "--help", "--lang", "es");
        assertTrue(es.out().startsWith("Uso: shapetrail rate"), es.out());
        assertTrue(es.out().contains("Calcula el somatotipo de un archivo CSV de valores finales"), es.out());
        assertTrue(es.out().contains("Muestra esta ayuda y termina."), es.out());
        Run pt = run("--lang=pt", "letters", "--help");
        assertTrue(pt.out().contains("Escreve cartas de acompanhamento (PDF)"), pt.out());
        Run en = run("rate", "--help");
        assertTrue(en.out().startsWith("Usage: shapetrail rate"), en.out());
        assertTrue(en.out().contains("Rate a CSV file of final measurement values"), en.out());
    }

    @Test
    void messagesAndTablesFollowTheLanguageAndTheProcessIsLeftAsItWas() {
        Locale before = Messages.current();
        Run missing = run("changes", "9999", "--db", file.toString(), "--lang", "pt");
        assertEquals(2, missing.code());
        assertEquals("Não existe nenhuma pessoa com o id 9999; o comando people lista-as.", missing.err().strip());
        assertEquals(before, Messages.current(), "a run in Portuguese leaves the process's language alone");

        Run text = run("changes", "1", "--db", file.toString(), "--lang", "es");
        assertEquals(0, text.code(), text.err());
        String[] lines = text.out().split("\n");
        // the demo's person 1 has rated visits; the count is worded in Spanish, the plural of cli.changes.head
        assertTrue(lines[0].matches(".+: \\d+ visitas con somatotipo"), lines[0]);
        // the columns are named in Spanish (cli.col.*), the CSV's names are not
        assertTrue(lines[1].matches("desde\\s+hasta\\s+somatotipo_desde\\s+somatotipo_hasta\\s+múltiplo_ruido\\s+veredicto.*"),
                lines[1]);
        // the table's days are written the Spanish way (the JDK's medium form, "11 sept 2023"), its ratings and
        // multiples take the decimal comma, its verdicts the Spanish words
        assertTrue(lines[2].matches("\\d{1,2} \\p{L}+\\.? \\d{4}\\s+\\d{1,2} \\p{L}+\\.? \\d{4}\\s+\\d,\\d-\\d,\\d-\\d,\\d\\s+\\d,\\d-\\d,\\d-\\d,\\d\\s+\\d+,\\d\\d\\s+"
                + "(más allá del ruido|dudoso|dentro del ruido)\\s.*"), lines[2]);

        Run csv = run("changes", "1", "--db", file.toString(), "--format", "csv", "--lang", "es");
        String row = csv.out().split("\n")[1];
        // the CSV format stays as documented (docs/cli.md): decimal points and the English verdict words
        assertTrue(row.matches("\\S+,\\S+,\\d\\.\\d-\\d\\.\\d-\\d\\.\\d,\\d\\.\\d-\\d\\.\\d-\\d\\.\\d,\\d+\\.\\d\\d,"
                + "(beyond noise|borderline|within noise),.*"), row);
    }

    @Test
    void argumentMistakesAreSaidInTheLanguageAskedAndTheUsageFollows() {
        Run missing = run("--lang", "es", "changes", "--db", file.toString());
        assertEquals(2, missing.code());
        // cli.parse.missing's Spanish, naming the positional parameter by its label, then the usage in Spanish
        assertTrue(missing.err().startsWith("Falta: ID" + System.lineSeparator() + "Uso: shapetrail changes"),
                missing.err());
        Run unknown = run("people", "--nope", "--lang", "pt");
        assertEquals(2, unknown.code());
        assertTrue(unknown.err().startsWith("Opção ou argumento desconhecido: --nope"), unknown.err());
    }

    @Test
    void anUnknownLanguageIsRefusedNamingTheChoices() {
        Run r = run("people", "--lang", "de");
        assertEquals(2, r.code());
        assertEquals("There is no language \"de\" for the command line: choose en, es or pt.", r.err().strip());
    }
}
