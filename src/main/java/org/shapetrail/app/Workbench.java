package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Locale;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

/**
 * The main window's content: the file bar at the top, the people list on the left, the pages on the
 * right (person, squad with its training blocks, measurers, settings; each its own view class, built when
 * first opened), the status line with progress and cancel, and the standing caution at the foot.
 */
public final class Workbench {
    private final WorkbenchContext ctx;
    private final BorderPane root = new BorderPane();
    private final PeopleListView people;
    private final PersonPageView person;
    private final TabPane pages = new TabPane();
    private final Tab personTab = new Tab(tr("window.tab.person"));
    private final Tab squadTab = new Tab(tr("window.tab.squad"));
    private final Tab measurersTab = new Tab(tr("window.tab.measurers"));
    private final Tab settingsTab = new Tab(tr("window.tab.settings"));
    private SquadPageView squad;
    private BlocksPageView blocks;
    private TabPane squadViews;
    private MeasurersPageView measurers;
    private final ToggleButton dark = new ToggleButton(tr("window.dark"));
    /** The name of what is open; its whole path is in the tooltip. */
    private final Label file = new Label();
    private final javafx.scene.control.Tooltip where = new javafx.scene.control.Tooltip();

    public Workbench(WorkbenchViewModel vm, Locale locale) {
        ctx = new WorkbenchContext(vm, locale, () -> root.getScene().getWindow());
        people = new PeopleListView(ctx);
        person = new PersonPageView(ctx);
        ctx.onShowPerson(id -> vm.rows().stream().filter(r -> r.id() == id).findFirst().ifPresent(r -> {
            vm.selectedProperty().set(r);
            pages.getSelectionModel().select(personTab);
        }));
        root.getStyleClass().add("workbench");
        root.setTop(new VBox(header(), readOnlyBanner()));
        root.setCenter(body());
        root.disableProperty().bind(ctx.storing);
        root.setBottom(footer());
        vm.loadedProperty().addListener((o, a, b) -> {
            if (ctx.live()) {
                refreshPages();
            }
        });
        vm.selectedProperty().addListener((o, a, b) -> {
            if (ctx.live()) {
                person.refresh();
            }
        });
        if (vm.loadedProperty().get() != null) { // built again for another language: show what is open now
            showSource(vm.loadedProperty().get());
            refreshPages();
        }
    }

    /** The file bar's name of what is open, and the buttons the account may use. */
    private void showSource(Loaded b) {
        file.setText(b == null ? "" : b.source().title() + (b.account().isEmpty() ? "" : " · " + b.account()));
        where.setText(b == null ? "" : b.source().name());
        if (b != null && b.source() instanceof org.shapetrail.store.RecordSource.Server s) {
            ServerConnectDialog.remember(s.address());
        }
        fitToRole(b);
    }

    /** What choosing a language does (the application builds the window again in it). */
    public void onSpeak(java.util.function.Consumer<Locale> c) {
        ctx.onSpeak(c);
    }

    /** This workbench has been replaced by one in another language: it stops following the state. */
    void retire() {
        ctx.retire();
    }

    /**
     * Takes the place of an earlier workbench of the same window: the same page, the same squad view,
     * the same theme.
     */
    void continueFrom(Workbench earlier) {
        dark.setSelected(earlier.dark.isSelected());
        int squadView = earlier.squadViews == null ? 0 : earlier.squadViews.getSelectionModel().getSelectedIndex();
        pages.getSelectionModel().select(earlier.pages.getSelectionModel().getSelectedIndex());
        if (squadViews != null) {
            squadViews.getSelectionModel().select(squadView);
        }
    }

    private Parent header() {
        Label title = new Label(ShapetrailApp.NAME);
        title.setId("app-title");
        title.getStyleClass().add("app-title");
        file.setId("file-name");
        file.getStyleClass().add("app-subtitle");
        // the file's name; its whole path is in the tooltip (a long temporary path would push the buttons away)
        file.setTooltip(where);
        ctx.vm.loadedProperty().addListener((o, a, b) -> {
            if (ctx.live()) {
                showSource(b);
            }
        });
        Button open = new Button(tr("window.open"));
        open.setId("open-file");
        open.setOnAction(e -> chooseFile());
        Button connect = new Button(tr("window.connect"));
        connect.setId("connect-server");
        connect.setOnAction(e -> connectToServer(null, null));
        ctx.vm.passwordWantedProperty().addListener((o, a, server) -> {
            if (server != null && ctx.live()) {
                javafx.application.Platform.runLater(() -> connectToServer(server.address().toString(),
                        tr("window.password.wanted", server.address().host(), server.address().user())));
            }
        });
        Button create = new Button(tr("window.new"));
        create.setId("new-file");
        create.setOnAction(e -> chooseNewFile());
        Button bring = new Button(tr("window.import"));
        bring.setId("import-file");
        bring.setOnAction(e -> importFile());
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        dark.setId("dark-theme");
        dark.selectedProperty().addListener((o, a, b) -> {
            if (b) {
                root.getStyleClass().add("dark");
            } else {
                root.getStyleClass().remove("dark");
            }
        });
        javafx.scene.control.MenuItem sample = new javafx.scene.control.MenuItem(tr("window.sample"));
        sample.setId("open-sample");
        sample.setOnAction(e -> openSample());
        javafx.scene.control.MenuItem about = new javafx.scene.control.MenuItem(tr("window.about"));
        about.setId("about");
        about.setOnAction(e -> about());
        javafx.scene.control.MenuButton help = new javafx.scene.control.MenuButton(tr("window.help"), null, sample, about);
        help.setId("help-menu");
        HBox bar = new HBox(12, title, file, gap, bring, create, open, connect, help, dark);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.getStyleClass().add("app-header");
        bar.setPadding(new Insets(10, 14, 10, 14));
        return bar;
    }

    /** Opens the dialog and, when the person connects, opens the server's record in this window. */
    private void connectToServer(String address, String why) {
        ServerConnectDialog.ask(ctx.window(), address, why).ifPresent(ctx.vm::open);
    }

    /**
     * Shows only what the account may do: a coach enters no visits and organises nothing, a measurer
     * organises nothing and makes no blocks (the server refuses these anyway; the buttons would only
     * mislead). On a file everything is there.
     */
    private void fitToRole(Loaded l) {
        boolean visits = l == null || l.entersVisits();
        boolean blocksToo = l == null || l.managesBlocks();
        boolean admin = l == null || l.administers();
        java.util.Map<String, Boolean> allowed = new java.util.LinkedHashMap<>();
        for (String id : new String[] {"new-visit", "edit-visit", "delete-visit", "undo"}) {
            allowed.put(id, visits);
        }
        for (String id : new String[] {"new-block", "edit-block", "delete-block", "undo-block"}) {
            allowed.put(id, blocksToo);
        }
        for (String id : new String[] {"new-person", "edit-person", "move-squad", "add-measurer", "new-squad",
            "import-file"}) {
            allowed.put(id, admin);
        }
        javafx.application.Platform.runLater(() -> allowed.forEach((id, yes) -> {
            for (javafx.scene.Node n : root.lookupAll("#" + id)) {
                n.setVisible(yes);
                n.setManaged(yes);
            }
        }));
    }

    /** Shown only while another window has this file for editing (FileClaim). */
    private Parent readOnlyBanner() {
        Label note = new Label();
        note.setId("read-only-note");
        note.getStyleClass().add("read-only-note");
        note.setWrapText(true);
        note.setMaxWidth(Double.MAX_VALUE);
        note.setPadding(new Insets(6, 14, 6, 14));
        note.textProperty().bind(ctx.vm.readOnlyNoteProperty());
        note.visibleProperty().bind(ctx.vm.readOnlyNoteProperty().isNotEmpty());
        note.managedProperty().bind(note.visibleProperty());
        return note;
    }

    private Parent body() {
        personTab.setContent(person.pane());
        // pages other than the person page are built when first opened: a faster start
        squadTab.setContent(new Label(tr("window.opening")));
        measurersTab.setContent(new Label(tr("window.opening")));
        settingsTab.setContent(new Label(tr("window.opening")));
        pages.getTabs().addAll(personTab, squadTab, measurersTab, settingsTab);
        pages.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        pages.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> fillCurrent());
        pages.setId("pages");
        SplitPane split = new SplitPane(people.root(), pages);
        split.setDividerPositions(0.51);
        return split;
    }

    /** Builds the selected page on first use and fills it if the file changed since. */
    private void fillCurrent() {
        Tab t = pages.getSelectionModel().getSelectedItem();
        if (t == squadTab) {
            if (squad == null) {
                squad = new SquadPageView(ctx);
                blocks = new BlocksPageView(ctx);
                Tab blocksTab = new Tab(tr("window.tab.blocks"), blocks.root());
                squadViews = new TabPane(new Tab(tr("window.tab.members"), squad.root()), blocksTab);
                squadViews.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
                squadViews.setId("squad-views");
                squadViews.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
                    if (b == blocksTab) {
                        blocks.fill(squad.squadChoice().getValue());
                    }
                });
                squadTab.setContent(squadViews);
            }
            squad.fill();
            if (squadViews.getSelectionModel().getSelectedIndex() == 1) {
                blocks.fill(squad.squadChoice().getValue());
            }
        } else if (t == measurersTab) {
            if (measurers == null) {
                measurers = new MeasurersPageView(ctx);
                measurersTab.setContent(measurers.root());
            }
            measurers.fill();
        } else if (t == settingsTab && !(settingsTab.getContent() instanceof VBox)) {
            settingsTab.setContent(new SettingsPageView(ctx).root());
        }
        fitToRole(ctx.loaded()); // the page may have been built just now
    }

    private Parent footer() {
        ProgressBar bar = new ProgressBar();
        bar.setId("progress");
        bar.progressProperty().bind(ctx.vm.runner().progressProperty());
        bar.visibleProperty().bind(ctx.vm.runner().busyProperty());
        Button cancel = new Button(tr("window.cancel"));
        cancel.setId("cancel-work");
        cancel.visibleProperty().bind(ctx.vm.runner().busyProperty());
        cancel.setOnAction(e -> ctx.vm.runner().cancelCurrent());
        Label status = new Label();
        status.setId("status");
        status.textProperty().bind(ctx.vm.statusProperty());
        Label error = new Label();
        error.setId("error");
        error.getStyleClass().add("error-line");
        error.setWrapText(true);
        error.textProperty().bind(ctx.vm.errorProperty());
        HBox line = new HBox(10, status, bar, cancel, error);
        line.setAlignment(Pos.CENTER_LEFT);
        line.setPadding(new Insets(4, 14, 4, 14));
        Label caution = new Label(Cautions.shapeNotWorth());
        caution.setId("caution");
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);
        caution.setPadding(new Insets(6, 14, 6, 14));
        return new VBox(line, caution);
    }

    private void refreshPages() {
        if (ctx.loaded() == null) {
            return;
        }
        // the other pages are filled when next looked at: a faster start
        if (squad != null) {
            squad.invalidate();
            blocks.invalidate();
        }
        if (measurers != null) {
            measurers.invalidate();
        }
        fillCurrent();
        person.refresh();
    }

    private void importFile() {
        Loaded l = ctx.loaded();
        if (l == null) {
            return;
        }
        FileChooser fc = new FileChooser();
        fc.setTitle(tr("window.csv.title"));
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(tr("window.csv.files"), "*.csv", "*.txt"));
        var f = fc.showOpenDialog(ctx.window());
        if (f == null) {
            return;
        }
        try {
            new ImportWizardView(new ImportWizardViewModel(l.source(), f.toPath()), ctx.vm.runner(), ctx.window(),
                    ctx.vm::reload).show();
        } catch (java.io.IOException | RuntimeException e) {
            ctx.vm.errorProperty().set(tr("window.file.unreadable", f.getName(), Errors.describe(e)));
        }
    }

    private void chooseNewFile() {
        FileChooser fc = new FileChooser();
        fc.setTitle(tr("window.new.title"));
        fc.setInitialFileName("academy.shapetrail");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(tr("window.files"), "*.shapetrail", "*.sqlite"));
        var f = fc.showSaveDialog(ctx.window());
        if (f != null) {
            ctx.vm.createAndOpen(f.toPath());
        }
    }

    /**
     * Opens the user's own copy of the sample academy (made in the data folder the first time), never the
     * original that came with the app.
     */
    void openSample() {
        try {
            ctx.vm.open(org.shapetrail.store.DataFolder.sampleCopy(org.shapetrail.store.DataFolder.userFolder()));
        } catch (org.shapetrail.store.StoreException e) {
            ctx.vm.errorProperty().set(e.getMessage());
        }
    }

    private void about() {
        javafx.scene.control.Alert a = new javafx.scene.control.Alert(javafx.scene.control.Alert.AlertType.INFORMATION,
                null, Buttons.close());
        a.initOwner(ctx.window());
        a.setTitle(tr("window.about"));
        a.setHeaderText(org.shapetrail.store.AppVersion.named());
        a.setContentText(tr("window.about.text", org.shapetrail.store.DataFolder.userFolder(),
                Cautions.shapeNotWorth()));
        a.showAndWait();
    }

    private void chooseFile() {
        FileChooser fc = new FileChooser();
        fc.setTitle(tr("window.open.title"));
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(tr("window.files"), "*.shapetrail", "*.sqlite", "*.db"));
        var f = fc.showOpenDialog(ctx.window());
        if (f != null) {
            ctx.vm.open(f.toPath());
        }
    }

    /** Opens the entry window for a new visit (or an edit) of the selected person. */
    VisitEntryView entryFor(org.shapetrail.store.Visit editing) {
        return person.entryFor(editing);
    }

    /** Opens the entry window for a new visit of the selected person (Ctrl+N). */
    void enterVisit() {
        person.enterVisit(null);
    }

    /** Shows the selected person's letter as it will print. */
    void previewLetter(org.shapetrail.letters.LetterSettings settings) {
        person.previewLetter(settings);
    }

    javafx.stage.Stage lastPreview() {
        return person.lastPreview;
    }

    public Parent root() {
        return root;
    }

    public WorkbenchViewModel viewModel() {
        return ctx.vm;
    }

    public PersonPane personPane() {
        return person.pane();
    }

    public TabPane pages() {
        return pages;
    }

    /** The squad page's choice of squad (built with the page). */
    public ComboBox<String> squadChoice() {
        if (squad == null) {
            pages.getSelectionModel().select(squadTab);
        }
        return squad.squadChoice();
    }
}
