package org.shapetrail.cli;

import static org.shapetrail.i18n.Messages.tr;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import org.shapetrail.store.Accounts;
import org.shapetrail.store.Database;
import org.shapetrail.store.StaffRole;
import org.shapetrail.store.StoreException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code account}: staff accounts on a server (an administrator's work). */
@Command(name = "account", mixinStandardHelpOptions = true,
        subcommands = {AccountCommand.Add.class, AccountCommand.ListAccounts.class, AccountCommand.Role.class,
            AccountCommand.Remove.class})
final class AccountCommand implements Runnable {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    static StaffRole role(String word) {
        return StaffRole.byWord(word).orElseThrow(() -> new StoreException(tr("cli.account.noRole", word)));
    }

    @Command(name = "add", mixinStandardHelpOptions = true)
    static final class Add implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Parameters(index = "0", paramLabel = "NAME", descriptionKey = "shapetrail.account.add.name")
        String name;

        @Option(names = "--role", required = true, paramLabel = "ROLE")
        String role;

        @Option(names = "--password-stdin")
        boolean passwordStdin;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() throws Exception {
            StaffRole r = role(role);
            char[] password = password(spec.commandLine().getErr());
            try (Database d = db.open()) {
                d.accounts(a -> {
                    a.add(name, r, password);
                    return null;
                });
                spec.commandLine().getOut().println(tr("cli.account.made", name, r.word(), d.name()));
            } finally {
                java.util.Arrays.fill(password, '\0');
            }
            return 0;
        }

        private char[] password(PrintWriter err) throws java.io.IOException {
            if (passwordStdin) {
                String line = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8)).readLine();
                if (line == null) {
                    throw new StoreException(tr("cli.account.noStdin"));
                }
                return line.toCharArray();
            }
            java.io.Console console = System.console();
            if (console == null) {
                throw new StoreException(tr("cli.account.noTerminal"));
            }
            char[] first = console.readPassword("%s", tr("cli.account.password", name));
            char[] again = console.readPassword("%s", tr("cli.account.again"));
            if (first == null || !java.util.Arrays.equals(first, again)) {
                throw new StoreException(tr("cli.account.differ"));
            }
            return first;
        }
    }

    @Command(name = "list", mixinStandardHelpOptions = true)
    static final class ListAccounts implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            PrintWriter out = spec.commandLine().getOut();
            try (Database d = db.open()) {
                java.util.List<Accounts.Account> all = d.accounts(Accounts::all);
                out.printf("%-32s %s%n", tr("cli.account.col.account"), tr("cli.account.col.role"));
                for (Accounts.Account a : all) {
                    out.printf("%-32s %s%n", a.name(), a.role().word());
                }
            }
            return 0;
        }
    }

    @Command(name = "role", mixinStandardHelpOptions = true)
    static final class Role implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Parameters(index = "0", paramLabel = "NAME")
        String name;

        @Parameters(index = "1", paramLabel = "ROLE", descriptionKey = "shapetrail.account.role.role")
        String role;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            StaffRole r = role(role);
            try (Database d = db.open()) {
                d.accounts(a -> {
                    a.setRole(name, r);
                    return null;
                });
                spec.commandLine().getOut().println(tr("cli.account.nowA", name, r.word()));
            }
            return 0;
        }
    }

    @Command(name = "remove", mixinStandardHelpOptions = true)
    static final class Remove implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Parameters(index = "0", paramLabel = "NAME")
        String name;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            try (Database d = db.open()) {
                d.accounts(a -> {
                    a.remove(name);
                    return null;
                });
                spec.commandLine().getOut().println(tr("cli.account.ended", name));
            }
            return 0;
        }
    }
}
