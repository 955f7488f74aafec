package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shapetrail.store.Database;
import org.shapetrail.store.TestServer;

/** The server's commands (account, trail, erase-person) against the real PostgreSQL server .ci/run starts. */
@Tag("server")
class ServerCommandsServerTest {
    @Test
    void anAdministratorMakesAccountsReadsTheTrailAndErases() throws Exception {
        String uri = TestServer.sampleAcademy("cli");
        String name = "ida_" + ProcessHandle.current().pid();
        InputStream stdin = System.in;
        String[] made;
        try {
            System.setIn(new ByteArrayInputStream("long enough pw\n".getBytes(StandardCharsets.UTF_8)));
            made = PointedFilesTest.run("account", "add", name, "--role", "measurer", "--password-stdin", "--db", uri);
        } finally {
            System.setIn(stdin);
        }
        assertEquals("0", made[0], made[2]);
        assertTrue(made[1].startsWith("Made the account " + name + " (measurer) on "), made[1]);
        String[] list = PointedFilesTest.run("account", "list", "--db", uri);
        assertTrue(list[1].lines().anyMatch(l -> l.matches(name + " +measurer")), list[1]);
        String[] role = PointedFilesTest.run("account", "role", name, "coach", "--db", uri);
        assertEquals(name + " is now a coach.\n", role[1]);
        String[] bad = PointedFilesTest.run("account", "role", name, "chief", "--db", uri);
        assertEquals("2", bad[0]);
        assertTrue(bad[2].startsWith("There is no role \"chief\": choose measurer, coach or administrator."), bad[2]);
        assertEquals("0", PointedFilesTest.run("account", "remove", name, "--db", uri)[0]);

        // the demo academy went in through the store: its lines are in the trail
        String[] trail = PointedFilesTest.run("trail", "--person", "1", "--db", uri, "--format", "csv");
        assertEquals("0", trail[0], trail[2]);
        assertTrue(trail[1].startsWith("at,who,action,what,person_id,visit_id,changes\n"), trail[1]);
        assertTrue(trail[1].contains(",insert,person 1,1,,"), trail[1]);

        String[] erased = PointedFilesTest.run("erase-person", "--yes", "1", "--db", uri);
        assertEquals("0", erased[0], erased[2]);
        assertTrue(erased[1].contains("with their lines of the audit trail"), erased[1]);
        String[] after = PointedFilesTest.run("trail", "--person", "1", "--db", uri);
        assertEquals("Nothing recorded.\n", after[1]);
        String[] day = PointedFilesTest.run("trail", "--from", java.time.LocalDate.now(java.time.ZoneOffset.UTC).toString(),
                "--db", uri);
        assertTrue(day[1].contains(" erasure a person (erased; nothing of them kept)"), day[1]);
    }
}
