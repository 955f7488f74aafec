package org.shapetrail.cli;

import static org.shapetrail.i18n.Messages.tr;

import java.io.PrintWriter;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.shapetrail.store.Database;
import org.shapetrail.store.Squad;
import org.shapetrail.store.StoreException;
import org.shapetrail.store.TrainingBlock;
import org.shapetrail.store.Visit;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code block list|new|edit|delete}: a squad's training blocks from the command line, as in the app. A
 * member's before and after visits are the defaults (the latest rated visit up to the first day and the
 * earliest from the last) unless chosen with {@code --pick PERSON_ID=BEFORE_DATE,AFTER_DATE}.
 */
@Command(name = "block", mixinStandardHelpOptions = true,
        subcommands = {BlockCommand.ListBlocks.class, BlockCommand.NewBlock.class, BlockCommand.EditBlock.class,
            BlockCommand.DeleteBlock.class})
final class BlockCommand implements Runnable {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The block of that name (any case), or a refusal that lists the blocks there are. */
    static TrainingBlock named(Database d, String name) {
        List<TrainingBlock> all = d.inTransaction(tx -> tx.blocks().all());
        return all.stream().filter(b -> b.name().strip().equalsIgnoreCase(name.strip())).findFirst()
                .orElseThrow(() -> new StoreException(tr("cli.block.none", name, all.isEmpty() ? tr("cli.none")
                        : String.join(", ", all.stream().map(TrainingBlock::name)
                        .toList()))));
    }

    /**
     * Picks given as PERSON_ID=BEFORE_DATE,AFTER_DATE: each date must be a day on which the person has
     * exactly one visit.
     */
    static Map<Long, TrainingBlock.Pick> picks(Database d, List<String> given) {
        Map<Long, TrainingBlock.Pick> out = new HashMap<>();
        for (String g : given) {
            String[] kv = g.split("=", 2);
            String[] days = kv.length == 2 ? kv[1].split(",", 2) : new String[0];
            if (days.length != 2) {
                throw new StoreException(tr("cli.pick.form", g));
            }
            long person;
            try {
                person = Long.parseLong(kv[0].strip());
            } catch (NumberFormatException e) {
                throw new StoreException(tr("cli.pick.id", g, kv[0]));
            }
            List<Visit> visits = d.inTransaction(tx -> tx.visits().ofPerson(person));
            out.put(person, new TrainingBlock.Pick(visitOn(visits, person, days[0], g), visitOn(visits, person, days[1], g)));
        }
        return out;
    }

    private static long visitOn(List<Visit> visits, long person, String dayText, String given) {
        LocalDate day;
        try {
            day = LocalDate.parse(dayText.strip());
        } catch (java.time.format.DateTimeParseException e) {
            throw new StoreException(tr("cli.pick.date", given, dayText));
        }
        List<Visit> on = visits.stream().filter(v -> v.measuredAt().toLocalDate().equals(day)).toList();
        if (on.size() != 1) {
            throw new StoreException(tr("cli.pick.visits", given, String.valueOf(person), on.size(), day));
        }
        return on.get(0).id();
    }

    @Command(name = "list", mixinStandardHelpOptions = true)
    static final class ListBlocks implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Mixin
        FormatOption output;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            Table t = new Table("id", "name", "squad", "starts_on", "ends_on", "chosen_visits", "aim");
            try (Database d = db.open()) {
                List<Squad> squads = d.inTransaction(tx -> tx.squads().all());
                for (TrainingBlock b : d.inTransaction(tx -> tx.blocks().all())) {
                    t.row(b.id(), b.name(), squads.stream().filter(s -> s.id() == b.squadId()).map(Squad::name)
                            .findFirst().orElse(""), b.startsOn(), b.endsOn(), b.picks().size(), b.aim());
                }
            }
            t.write(spec.commandLine().getOut(), output.format);
            return 0;
        }
    }

    @Command(name = "new", mixinStandardHelpOptions = true)
    static final class NewBlock implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Option(names = "--squad", required = true, paramLabel = "NAME")
        String squad;

        @Option(names = "--name", required = true, paramLabel = "NAME")
        String name;

        @Option(names = "--start", required = true, paramLabel = "DATE")
        LocalDate start;

        @Option(names = "--end", required = true, paramLabel = "DATE")
        LocalDate end;

        @Option(names = "--aim", defaultValue = "", paramLabel = "TEXT")
        String aim;

        @Option(names = "--pick", paramLabel = "PERSON_ID=BEFORE_DATE,AFTER_DATE")
        List<String> picks = new ArrayList<>();

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            if (end.isBefore(start)) {
                throw new StoreException(tr("cli.block.order", end, start));
            }
            try (Database d = db.open()) {
                Squad s = d.inTransaction(tx -> tx.squads().all()).stream().filter(x -> x.name().equalsIgnoreCase(
                        squad.strip())).findFirst().orElseThrow(() -> new StoreException(tr("cli.squad.none",
                        squad)));
                Map<Long, TrainingBlock.Pick> chosen = picks(d, picks);
                TrainingBlock b = d.inTransaction(tx -> tx.blocks().insert(new TrainingBlock(0, name, s.id(), start, end,
                        aim, chosen)));
                spec.commandLine().getOut().println(tr("cli.block.created", b.name(), s.name(), b.startsOn(),
                        b.endsOn()));
            }
            return 0;
        }
    }

    @Command(name = "edit", mixinStandardHelpOptions = true)
    static final class EditBlock implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Parameters(index = "0", paramLabel = "BLOCK", descriptionKey = "shapetrail.block.edit.block")
        String block;

        @Option(names = "--name", paramLabel = "NAME")
        String name;

        @Option(names = "--start", paramLabel = "DATE")
        LocalDate start;

        @Option(names = "--end", paramLabel = "DATE")
        LocalDate end;

        @Option(names = "--aim", paramLabel = "TEXT")
        String aim;

        @Option(names = "--pick", paramLabel = "PERSON_ID=BEFORE_DATE,AFTER_DATE")
        List<String> picks = new ArrayList<>();

        @Option(names = "--default-visits")
        boolean defaults;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            try (Database d = db.open()) {
                TrainingBlock b = named(d, block);
                Map<Long, TrainingBlock.Pick> chosen = new HashMap<>(defaults ? Map.of() : b.picks());
                chosen.putAll(picks(d, picks));
                LocalDate s = start != null ? start : b.startsOn();
                LocalDate e = end != null ? end : b.endsOn();
                if (e.isBefore(s)) {
                    throw new StoreException(tr("cli.block.order", e, s));
                }
                TrainingBlock changed = new TrainingBlock(b.id(), name != null ? name : b.name(), b.squadId(), s, e,
                        aim != null ? aim : b.aim(), chosen);
                d.inTransaction(tx -> {
                    tx.blocks().update(changed);
                    return null;
                });
                spec.commandLine().getOut().println(tr("cli.block.changed", changed.name(), changed.startsOn(),
                        changed.endsOn(), changed.picks().size()));
            }
            return 0;
        }
    }

    @Command(name = "delete", mixinStandardHelpOptions = true)
    static final class DeleteBlock implements Callable<Integer> {
        @Mixin
        DbOption db;

        @Parameters(index = "0", paramLabel = "BLOCK", descriptionKey = "shapetrail.block.delete.block")
        String block;

        @Option(names = "--yes")
        boolean yes;

        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Override
        public Integer call() {
            PrintWriter out = spec.commandLine().getOut();
            try (Database d = db.open()) {
                TrainingBlock b = named(d, block);
                if (!yes && !Confirmation.ask(out, tr("cli.block.deleteAsk", b.name(), b.startsOn(),
                        b.endsOn()), "DELETE")) { // not words: the word typed to confirm
                    out.println(tr("cli.nothingDeleted"));
                    return 1;
                }
                d.inTransaction(tx -> tx.blocks().delete(b.id()));
                out.println(tr("cli.block.deleted", b.name()));
            }
            return 0;
        }
    }
}
