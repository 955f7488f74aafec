package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RateCommandTest {
    static final String HEADER = "id,stature_cm,mass_kg,triceps_mm,subscapular_mm,supraspinale_mm,medial_calf_mm,"
            + "humerus_cm,femur_cm,arm_flexed_cm,calf_cm";
    static final String LEAN = "A1,178.0,72.0,9.0,10.0,7.0,8.0,7.0,9.8,33.0,37.0";
    // Heath-Carter for LEAN, evaluated independently from the published equations (see HeathCarterTest):
    // 2.4900-4.9408-2.7399, HWR 42.7867, X = 0.2499, Y = 4.6517; half units 2½-5-2½: balanced mesomorph
    static final String LEAN_OUT = "A1,2.4900,4.9408,2.7399,42.7867,0.2499,4.6517,balanced mesomorph,";

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    Run run(String content, String... extra) throws IOException {
        Path f = dir.resolve("in.csv");
        Files.writeString(f, content, StandardCharsets.UTF_8);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] args = new String[2 + extra.length];
        args[0] = "rate";
        args[1] = f.toString();
        System.arraycopy(extra, 0, args, 2, extra.length);
        int code = ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void goodRowsAreRatedWithFourDecimals() throws IOException {
        Run r = run(HEADER + "\n" + LEAN + "\n");
        assertEquals(0, r.code(), r.err());
        assertEquals("id,endomorphy,mesomorphy,ectomorphy,hwr,x,y,category,problems\n" + LEAN_OUT + "\n", r.out());
    }

    @Test
    void columnsInAnyOrderWithExtraColumnsAndABom() throws IOException {
        String content = "\uFEFFnote,calf_cm,arm_flexed_cm,femur_cm,humerus_cm,medial_calf_mm,supraspinale_mm,"
                + "subscapular_mm,triceps_mm,mass_kg,stature_cm,id\n"
                + "x,37.0,33.0,9.8,7.0,8.0,7.0,10.0,9.0,72.0,178.0,A1\n";
        Run r = run(content);
        assertEquals(0, r.code(), r.err());
        assertEquals(LEAN_OUT, r.out().split("\n")[1]);
    }

    @Test
    void aBadRowIsReportedWithItsLineAndEveryReasonWhileGoodRowsAreStillRated() throws IOException {
        String bad = "B2,1.78,72.0,1.2,10.0,7.0,8.0,abc,9.8,33.0,37.0";
        Run r = run(HEADER + "\n" + LEAN + "\n" + bad + "\n" + LEAN + "\n");
        assertEquals(1, r.code());
        String[] lines = r.out().split("\n");
        assertEquals(LEAN_OUT, lines[1]);
        assertEquals("B2,,,,,,,,\"line 3: Stature 1.78 looks like metres; enter 178.0 cm. "
                + "Triceps skinfold 1.2 looks like centimetres; enter 12.0 mm. "
                + "Humerus breadth \"\"abc\"\" is not a number; enter the value in cm.\"", lines[2]);
        assertEquals(LEAN_OUT, lines[3]);
    }

    @Test
    void aMissingRequiredColumnMakesTheFileUnreadable() throws IOException {
        Run r = run("id,stature_cm,mass_kg\nA,170,60\n");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("triceps_mm"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void aFileThatDoesNotExistIsUnreadable() {
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(new String[] {"rate", dir.resolve("none.csv").toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(2, code);
        assertTrue(err.toString().contains("no such file"));
    }

    @Test
    void uncorrectedEndomorphyOnRequest() throws IOException {
        // X = 26 uncorrected: endomorphy 2.6193 (Carter & Heath 1990, by hand; see HeathCarterTest)
        Run r = run(HEADER + "\n" + LEAN + "\n", "--uncorrected-endomorphy");
        assertEquals("2.6193", r.out().split("\n")[1].split(",")[1]);
    }
}
