package org.shapetrail.app;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;
import java.util.List;
import java.util.Optional;
import javafx.beans.property.SimpleStringProperty;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Parent;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.Spinner;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.util.StringConverter;
import org.shapetrail.chart.fx.ChartCanvas;
import org.shapetrail.growth.GrowthAlert;
import org.shapetrail.growth.MaturityStatus;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.NoiseModel;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.measure.Site;
import org.shapetrail.noise.BiologicalVariation;
import org.shapetrail.store.Database;
import org.shapetrail.store.Squad;
import org.shapetrail.store.Visit;

/**
 * The main window's content: the people browser on the left; the person, squad, measurers and settings
 * pages on the right; the status line with progress and cancel; the standing caution at the foot.
 */
public final class Workbench {
    private final WorkbenchViewModel vm;
    private final Locale locale;
    private final BorderPane root = new BorderPane();
    private final PersonPane person = new PersonPane();
    private final TabPane pages = new TabPane();
    private final Tab personTab = new Tab("Person");
    private final Tab squadTab = new Tab("Squad");
    private final Tab measurersTab = new Tab("Measurers");
    private final Tab settingsTab = new Tab("Settings");
    private final ComboBox<String> squadChoice = new ComboBox<>();
    private final Label squadSummary = new Label();
    private final VBox squadBlocks = new VBox(2);
    private final TableView<PersonRow> squadMembers;
    private final ChartCanvas squadChart = new ChartCanvas();
    private final ComboBox<String> blockChoice = new ComboBox<>();
    private final Label blockSummary = new Label();
    private final javafx.scene.control.ListView<String> blockAthletes = new javafx.scene.control.ListView<>();
    private final Label blockLeftOut = new Label();
    private final ChartCanvas blockChart = new ChartCanvas();
    private final ChartCanvas blockProfile = new ChartCanvas();
    private final TableView<NoiseModel.TemRow> tem = new TableView<>();
    private final ToggleButton dark = new ToggleButton("Dark theme");
    /** Earlier versions of visits changed in this session, newest first, for undo. */
    private final Deque<Runnable> undo = new ArrayDeque<>();
    /** True while a deletion or an undo is being written: the window takes no input meanwhile. */
    private final javafx.beans.property.BooleanProperty storing = new javafx.beans.property.SimpleBooleanProperty();

    public Workbench(WorkbenchViewModel vm, Locale locale) {
        this.vm = vm;
        this.locale = locale;
        squadMembers = PeopleTable.create("squad-members", locale, true);
        root.getStyleClass().add("workbench");
        root.setTop(header());
        root.setCenter(body());
        root.disableProperty().bind(storing);
        root.setBottom(footer());
        vm.loadedProperty().addListener((o, a, b) -> refreshPages());
        vm.selectedProperty().addListener((o, a, b) -> showPerson());
    }

    private Parent header() {
        Label title = new Label("Shapetrail");
        title.setId("app-title");
        title.getStyleClass().add("app-title");
        Label file = new Label();
        file.setId("file-name");
        file.getStyleClass().add("app-subtitle");
        vm.loadedProperty().addListener((o, a, b) -> file.setText(b == null ? "" : b.file().toString()));
        Button open = new Button("Open file…");
        open.setId("open-file");
        open.setOnAction(e -> chooseFile());
        Button create = new Button("New file…");
        create.setId("new-file");
        create.setOnAction(e -> chooseNewFile());
        Button bring = new Button("Bring in a spreadsheet…");
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
        HBox bar = new HBox(12, title, file, gap, bring, create, open, dark);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.getStyleClass().add("app-header");
        bar.setPadding(new Insets(10, 14, 10, 14));
        return bar;
    }

    private Parent body() {
        TextField search = new TextField();
        search.setId("search");
        search.setPromptText("Find a person (Ctrl+F)");
        search.textProperty().bindBidirectional(vm.searchProperty());
        ComboBox<String> squad = new ComboBox<>(vm.squads());
        squad.setId("squad-filter");
        squad.valueProperty().bindBidirectional(vm.squadProperty());
        ComboBox<AgeBand> age = new ComboBox<>();
        age.setId("age-filter");
        age.getItems().setAll(AgeBand.values());
        age.valueProperty().bindBidirectional(vm.ageBandProperty());
        ComboBox<MaturityStatus> maturity = new ComboBox<>();
        maturity.setId("maturity-filter");
        maturity.getItems().add(null);
        maturity.getItems().addAll(MaturityStatus.values());
        maturity.setConverter(new StringConverter<>() {
            @Override
            public String toString(MaturityStatus m) {
                return m == null ? "Any maturity" : m.words();
            }

            @Override
            public MaturityStatus fromString(String s) {
                return null;
            }
        });
        maturity.valueProperty().bindBidirectional(vm.maturityProperty());
        CheckBox rapid = new CheckBox("Rapid growth only");
        rapid.setId("rapid-filter");
        rapid.selectedProperty().bindBidirectional(vm.rapidOnlyProperty());
        TableView<PersonRow> people = PeopleTable.create("people", locale, false);
        people.setItems(vm.rows());
        people.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                vm.selectedProperty().set(b);
            }
        });
        Button newPerson = new Button("New person…");
        newPerson.setId("new-person");
        newPerson.setOnAction(e -> personForm(null));
        Label count = new Label();
        count.setId("people-count");
        vm.rows().addListener((javafx.collections.ListChangeListener<PersonRow>) c -> count.setText(
                vm.rows().size() + " shown · click a column to sort (e.g. Growth for the fastest growing)"));
        HBox filters = new HBox(6, squad, age, maturity);
        VBox left = new VBox(6, search, filters, new HBox(12, rapid, newPerson), people, count);
        left.setPadding(new Insets(8));
        VBox.setVgrow(people, Priority.ALWAYS);

        person.onNewVisit(() -> enterVisit(null));
        person.onEditVisit(line -> editVisit(line));
        person.onDeleteVisit(line -> deleteVisit(line));
        person.undo.setOnAction(e -> undoLast());
        person.editPerson.setOnAction(e -> vm.selectedHistory().ifPresent(h -> personForm(h.person())));
        person.moveSquad.setOnAction(e -> vm.selectedHistory().ifPresent(h -> moveToSquad(h.person())));
        person.previewLetter.setOnAction(e -> previewLetter(new org.shapetrail.letters.LetterSettings(
                "Saltmarsh Bay Sports Academy", "the academy physiotherapist", "", "via the academy office",
                LocalDate.now().minusYears(1), LocalDate.now(), false)));
        person.undo.setDisable(true);
        personTab.setContent(person);
        // pages other than the person page are built when first opened: a faster start
        squadTab.setContent(new Label("Opening…"));
        measurersTab.setContent(new Label("Opening…"));
        settingsTab.setContent(new Label("Opening…"));
        pages.getTabs().addAll(personTab, squadTab, measurersTab, settingsTab);
        pages.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        pages.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b == squadTab) {
                ensureBuilt(squadTab);
                fillSquadPage();
            } else if (b == measurersTab) {
                ensureBuilt(measurersTab);
                fillTem();
            } else if (b == settingsTab) {
                ensureBuilt(settingsTab);
            }
        });
        pages.setId("pages");
        SplitPane split = new SplitPane(left, pages);
        split.setDividerPositions(0.42);
        return split;
    }

    private Parent squadPage() {
        squadChoice.setId("squad-choice");
        squadChoice.valueProperty().addListener((o, a, b) -> showSquad());
        squadSummary.setId("squad-summary");
        squadSummary.setWrapText(true);
        squadChart.setId("squad-chart");
        squadChart.setMinSize(300, 300);
        squadChart.setOnSelect(id -> vm.rows().stream().filter(r -> ("person:" + r.id()).equals(id)).findFirst()
                .ifPresent(r -> {
                    vm.selectedProperty().set(r);
                    pages.getSelectionModel().select(personTab);
                }));
        Button letters = new Button("Write letters for this squad…");
        letters.setId("write-letters");
        letters.setOnAction(e -> writeLetters());
        Button newSquad = new Button("New squad…");
        newSquad.setId("new-squad");
        newSquad.setOnAction(e -> askAndOrganise("New squad", "Name of the squad (e.g. Under-15 girls)",
                (file, name) -> Organising.addSquad(file, name)));
        VBox head = new VBox(6, new HBox(8, squadChoice, letters, newSquad), squadSummary, new Label("Training blocks"),
                squadBlocks);
        head.setPadding(new Insets(10, 12, 8, 12));
        BorderPane members = new BorderPane();
        members.setTop(head);
        SplitPane split = new SplitPane(squadMembers, squadChart);
        split.setDividerPositions(0.5);
        members.setCenter(split);

        blockChoice.setId("block-choice");
        blockChoice.valueProperty().addListener((o, a, b) -> showBlock());
        blockSummary.setId("block-summary");
        blockSummary.setWrapText(true);
        blockAthletes.setId("block-athletes");
        blockLeftOut.setId("block-left-out");
        blockLeftOut.setWrapText(true);
        blockChart.setId("block-chart");
        blockProfile.setId("block-profile");
        blockChart.setMinSize(280, 280);
        blockProfile.setMinSize(220, 160);
        Label key = new Label("Arrows: each athlete before → after; ━━ beyond noise  ╺ ╸ borderline  ┈┈ within noise;"
                + " ◆ group means (grey before, amber after) with their dispersion");
        key.getStyleClass().add("hint");
        key.setWrapText(true);
        VBox blockHead = new VBox(6, blockChoice, blockSummary, blockLeftOut);
        blockHead.setPadding(new Insets(10, 12, 8, 12));
        SplitPane chartSplit = new SplitPane(blockChart, blockProfile);
        chartSplit.setOrientation(javafx.geometry.Orientation.VERTICAL);
        chartSplit.setDividerPositions(0.62);
        BorderPane charts = new BorderPane(chartSplit);
        charts.setBottom(key);
        SplitPane blockSplit = new SplitPane(blockAthletes, charts);
        blockSplit.setDividerPositions(0.42);
        BorderPane blocks = new BorderPane(blockSplit);
        blocks.setTop(blockHead);
        TabPane inner = new TabPane(new Tab("Members", members), new Tab("Training blocks", blocks));
        inner.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        inner.setId("squad-views");
        return inner;
    }

    private Parent measurersPage() {
        tem.setId("tem-table");
        addTemColumn("Measurer", r -> r.measurer().name(), 120);
        addTemColumn("Site", r -> r.site().label(), 170);
        addTemColumn("People", r -> Integer.toString(r.estimate().people()), 60);
        addTemColumn("TEM", r -> Numbers.fmt(locale, r.estimate().duplicateTem(), 3) + " " + r.site().unit().symbol(), 80);
        addTemColumn("Relative TEM", r -> Numbers.fmt(locale, r.estimate().relativeTemPercent(), 2) + " %", 90);
        addTemColumn("Target", r -> "≤ " + Numbers.fmt(locale, org.shapetrail.noise.TemTargets.target(r.site().kind()), 1)
                + " %", 60);
        addTemColumn("Standing", r -> r.standing().words(), 200);
        addTemColumn("Verdicts use", r -> r.usesDefault() ? "default TEM (too few people)" : "own TEM", 170);
        Label note = new Label("TEM from the first two trials of every site and visit (duplicate form). Targets:"
                + " skinfolds ≤ 5 % (≤ 7.5 % entry level), other measures ≤ 1 % (≤ 1.5 %); common practice."
                + " Below " + org.shapetrail.noise.DefaultErrors.MIN_PEOPLE + " people a site uses the default TEM.");
        note.setWrapText(true);
        Button add = new Button("Add measurer…");
        add.setId("add-measurer");
        add.setOnAction(e -> askAndOrganise("Add measurer", "Name of the measurer (as visits will show it)",
                (file, name) -> Organising.addMeasurer(file, name, "")));
        measurerList.setId("measurer-list");
        measurerList.setWrapText(true);
        VBox box = new VBox(8, new HBox(8, add, measurerList), note, tem);
        box.setPadding(new Insets(10));
        VBox.setVgrow(tem, Priority.ALWAYS);
        return box;
    }

    private final Label measurerList = new Label();

    /** Asks for one name, then makes the organising change off the FX thread; a refusal is shown as it is. */
    private void askAndOrganise(String title, String prompt,
                                java.util.function.BiFunction<Path, String, Optional<String>> change) {
        Loaded l = vm.loadedProperty().get();
        if (l == null) {
            return;
        }
        javafx.scene.control.TextInputDialog d = new javafx.scene.control.TextInputDialog();
        d.setTitle(title);
        d.setHeaderText(prompt);
        d.initOwner(root.getScene().getWindow());
        d.showAndWait().ifPresent(name -> organise(() -> change.apply(l.file(), name)));
    }

    private void organise(java.util.function.Supplier<Optional<String>> change) {
        Optional<String> refused;
        try {
            refused = OffFxThread.call(storing, change::get);
        } catch (RuntimeException e) {
            refused = Optional.of(Errors.describe(e));
        }
        if (refused.isPresent()) {
            vm.errorProperty().set(refused.get());
        } else {
            vm.errorProperty().set("");
            vm.reload();
        }
    }

    /** The choice in "Move to squad" for someone who leaves: their memberships end on the chosen day. */
    private static final org.shapetrail.store.Squad LEAVES = new org.shapetrail.store.Squad(-1, "No squad (leaves)");

    private void moveToSquad(org.shapetrail.store.Person p) {
        Loaded l = vm.loadedProperty().get();
        if (l == null) {
            return;
        }
        javafx.scene.control.Dialog<ButtonType> d = new javafx.scene.control.Dialog<>();
        d.setTitle("Move to squad");
        d.setHeaderText(p.displayName() + " moves to another squad (the current membership ends the day before),"
                + " or leaves: choose \"" + LEAVES.name() + "\" and the last day.");
        d.initOwner(root.getScene().getWindow());
        ComboBox<org.shapetrail.store.Squad> to = new ComboBox<>(javafx.collections.FXCollections.observableArrayList(
                l.builder().academy().squads()));
        to.getItems().add(LEAVES);
        to.setId("move-to-squad");
        to.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(org.shapetrail.store.Squad s) {
                return s == null ? "" : s.name();
            }

            @Override
            public org.shapetrail.store.Squad fromString(String s) {
                return null;
            }
        });
        javafx.scene.control.DatePicker from = new javafx.scene.control.DatePicker(java.time.LocalDate.now());
        from.setId("move-from");
        javafx.scene.layout.GridPane g = new javafx.scene.layout.GridPane();
        g.setHgap(8);
        g.setVgap(8);
        g.addRow(0, new Label("Squad"), to);
        Label fromLabel = new Label("From");
        fromLabel.textProperty().bind(javafx.beans.binding.Bindings.when(to.valueProperty().isEqualTo(LEAVES))
                .then("Last day").otherwise("From"));
        g.addRow(1, fromLabel, from);
        d.getDialogPane().setContent(g);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.CANCEL, ButtonType.OK);
        if (d.showAndWait().orElse(ButtonType.CANCEL) == ButtonType.OK) {
            organise(() -> to.getValue() == LEAVES ? Organising.leave(l.file(), p.id(), from.getValue())
                    : Organising.moveToSquad(l.file(), p.id(), to.getValue(), from.getValue()));
        }
    }

    private void addTemColumn(String name, java.util.function.Function<NoiseModel.TemRow, String> f, double w) {
        TableColumn<NoiseModel.TemRow, String> c = new TableColumn<>(name);
        c.setCellValueFactory(d -> new SimpleStringProperty(f.apply(d.getValue())));
        c.setPrefWidth(w);
        tem.getColumns().add(c);
    }

    private Parent settingsPage() {
        Spinner<Double> threshold = new Spinner<>(3.0, 15.0, GrowthAlert.DEFAULT_CM_PER_YEAR, 0.5);
        threshold.setId("alert-threshold");
        threshold.setEditable(true);
        Spinner<Double> mass = new Spinner<>(0.0, 3.0, AnalysisSettings.DEFAULT_MASS_DAY_TO_DAY_KG, 0.1);
        mass.setId("mass-variation");
        mass.setEditable(true);
        CheckBox uncorrected = new CheckBox("Endomorphy from the skinfold sum without the height correction"
                + " (170.18 / stature); the usual form has it");
        uncorrected.setId("uncorrected-endomorphy");
        Button apply = new Button("Recompute with these settings");
        apply.setId("recompute");
        apply.setOnAction(e -> {
            AnalysisSettings s = vm.settings();
            vm.recompute(new AnalysisSettings(uncorrected.isSelected()
                    ? org.shapetrail.somatotype.EndomorphyVariant.UNCORRECTED
                    : org.shapetrail.somatotype.EndomorphyVariant.HEIGHT_CORRECTED, s.defaults(),
                    new BiologicalVariation(java.util.Map.of(Site.BODY_MASS, mass.getValue())),
                    new GrowthAlert(threshold.getValue())));
        });
        VBox box = new VBox(10,
                new Label("Rapid-growth alert above (cm per year; common practice 7)"), threshold,
                new Label("Body mass day-to-day variation added to measurement error (kg; 0 to leave out)"), mass,
                uncorrected, apply);
        box.setPadding(new Insets(12));
        return box;
    }

    private Parent footer() {
        ProgressBar bar = new ProgressBar();
        bar.setId("progress");
        bar.progressProperty().bind(vm.runner().progressProperty());
        bar.visibleProperty().bind(vm.runner().busyProperty());
        Button cancel = new Button("Cancel");
        cancel.setId("cancel-work");
        cancel.visibleProperty().bind(vm.runner().busyProperty());
        cancel.setOnAction(e -> vm.runner().cancelCurrent());
        Label status = new Label();
        status.setId("status");
        status.textProperty().bind(vm.statusProperty());
        Label error = new Label();
        error.setId("error");
        error.getStyleClass().add("error-line");
        error.textProperty().bind(vm.errorProperty());
        HBox line = new HBox(10, status, bar, cancel, error);
        line.setAlignment(Pos.CENTER_LEFT);
        line.setPadding(new Insets(4, 14, 4, 14));
        Label caution = new Label(Cautions.SHAPE_NOT_WORTH);
        caution.setId("caution");
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);
        caution.setPadding(new Insets(6, 14, 6, 14));
        return new VBox(line, caution);
    }

    private void refreshPages() {
        Loaded l = vm.loadedProperty().get();
        if (l == null) {
            return;
        }
        // the squad and measurers pages are filled when first looked at: a faster start
        squadStale = true;
        temStale = true;
        Tab current = pages.getSelectionModel().getSelectedItem();
        if (current == squadTab) {
            fillSquadPage();
        } else if (current == measurersTab) {
            fillTem();
        }
        showPerson();
    }

    private final java.util.Set<Tab> built = new java.util.HashSet<>();

    private void ensureBuilt(Tab t) {
        if (built.add(t)) {
            t.setContent(t == squadTab ? squadPage() : t == measurersTab ? measurersPage() : settingsPage());
        }
    }

    private boolean squadStale = true;
    private boolean temStale = true;

    private void fillTem() {
        Loaded l = vm.loadedProperty().get();
        if (l != null && temStale) {
            temStale = false;
            tem.getItems().setAll(l.builder().noise().temReport());
            java.util.List<String> names = l.builder().academy().measurers().stream()
                    .map(org.shapetrail.store.Measurer::name).toList();
            measurerList.setText(names.isEmpty() ? "No measurers in this file yet: add one before the first visit."
                    : "Measurers in this file: " + String.join(", ", names));
        }
    }

    private void fillSquadPage() {
        Loaded l = vm.loadedProperty().get();
        if (l == null || !squadStale) {
            return;
        }
        squadStale = false;
        String keep = squadChoice.getValue();
        squadChoice.getItems().setAll(l.builder().academy().squads().stream().map(Squad::name).toList());
        squadChoice.setValue(keep != null && squadChoice.getItems().contains(keep) ? keep
                : squadChoice.getItems().isEmpty() ? null : squadChoice.getItems().get(0));
        showSquad();
    }

    private void showPerson() {
        Optional<PersonHistory> h = vm.selectedHistory();
        if (h.isEmpty()) {
            return;
        }
        Loaded l = vm.loadedProperty().get();
        person.show(h.get(), WorkbenchViewModel.currentSquad(l.builder().academy(), h.get().person().id()), locale);
    }

    private void showSquad() {
        Loaded l = vm.loadedProperty().get();
        String name = squadChoice.getValue();
        if (l == null || name == null) {
            return;
        }
        l.builder().academy().squads().stream().filter(s -> s.name().equals(name)).findFirst().ifPresent(s -> {
            SquadPage page = SquadPage.of(l, s, LocalDate.now(), locale);
            squadSummary.setText(page.summary());
            squadMembers.getItems().setAll(page.members());
            squadBlocks.getChildren().setAll(page.blocks().isEmpty() ? java.util.List.of(new Label("none"))
                    : page.blocks().stream().map(Label::new).toList());
            squadChart.setModel(page.chart());
            List<String> names = l.builder().academy().blocks().stream().filter(b -> b.squadId() == s.id())
                    .map(org.shapetrail.store.TrainingBlock::name).toList();
            blockChoice.getItems().setAll(names);
            blockChoice.setValue(names.isEmpty() ? null : names.get(names.size() - 1));
            if (names.isEmpty()) {
                blockSummary.setText("This squad has no training blocks.");
                blockAthletes.getItems().clear();
                blockLeftOut.setText("");
            }
        });
    }

    private void showBlock() {
        Loaded l = vm.loadedProperty().get();
        String name = blockChoice.getValue();
        if (l == null || name == null) {
            return;
        }
        l.builder().academy().blocks().stream().filter(b -> b.name().equals(name)).findFirst().ifPresent(b -> {
            BlockPage page = BlockPage.of(org.shapetrail.history.BlockReview.of(l.builder(), b,
                    org.shapetrail.history.BlockReview.DEFAULT_WINDOW_DAYS, p -> l.histories().get(p.id())), locale);
            blockSummary.setText(page.summary());
            blockAthletes.getItems().setAll(page.athletes());
            blockLeftOut.setText(page.leftOut().isEmpty() ? "" : "Left out: " + String.join("; ", page.leftOut()));
            blockChart.setModel(page.chart());
            blockProfile.setModel(page.profile());
        });
    }

    /** Shows the pages of the selected person's letter for the period, as they will print. */
    void previewLetter(org.shapetrail.letters.LetterSettings settings) {
        Optional<PersonHistory> h = vm.selectedHistory();
        if (h.isEmpty()) {
            return;
        }
        Loaded l = vm.loadedProperty().get();
        vm.runner().run("Preparing the letter", () -> org.shapetrail.letters.LetterPreview.pages(
                new org.shapetrail.letters.LetterComposer(l.builder(), settings, locale).compose(h.get()), 80), pages -> {
                    VBox box = new VBox(10);
                    box.setId("letter-preview");
                    for (var img : pages) {
                        javafx.scene.image.ImageView v = new javafx.scene.image.ImageView(
                                javafx.embed.swing.SwingFXUtils.toFXImage(img, null));
                        v.setPreserveRatio(true);
                        v.setFitWidth(640);
                        box.getChildren().add(v);
                    }
                    javafx.stage.Stage s = new javafx.stage.Stage();
                    s.initOwner(root.getScene().getWindow());
                    s.setTitle("Letter preview — " + h.get().person().displayName());
                    s.setScene(new javafx.scene.Scene(new javafx.scene.control.ScrollPane(box), 680, 820));
                    s.show();
                    lastPreview = s;
                }, t -> vm.errorProperty().set(Errors.describe(t)));
    }

    javafx.stage.Stage lastPreview;

    private void writeLetters() {
        Loaded l = vm.loadedProperty().get();
        String name = squadChoice.getValue();
        if (l == null || name == null) {
            return;
        }
        Optional<org.shapetrail.letters.LetterSettings> settings = LettersDialog.ask(root.getScene().getWindow(),
                "Letters — " + name);
        if (settings.isEmpty()) {
            return;
        }
        javafx.stage.DirectoryChooser dc = new javafx.stage.DirectoryChooser();
        dc.setTitle("Folder for the letters");
        var folder = dc.showDialog(root.getScene().getWindow());
        if (folder == null) {
            return;
        }
        var academy = l.builder().academy();
        var squad = academy.squads().stream().filter(s -> s.name().equals(name)).findFirst().orElseThrow();
        List<PersonHistory> people = academy.membersOn(squad.id(), settings.get().to()).stream()
                .map(id -> l.histories().get(id)).toList();
        var composer = new org.shapetrail.letters.LetterComposer(l.builder(), settings.get(), locale);
        List<Path> targets = new java.util.ArrayList<>(people.stream().map(h -> folder.toPath().resolve(
                org.shapetrail.letters.LetterBatch.fileName(h.person().id(), h.person().displayName()))).toList());
        targets.add(folder.toPath().resolve(org.shapetrail.letters.LetterBatch.COMBINED));
        List<Path> there = org.shapetrail.OutputFiles.existing(targets);
        if (!there.isEmpty()) {
            Alert ask = new Alert(Alert.AlertType.CONFIRMATION, there.size() + " of these letters are in " + folder
                    + " already (e.g. " + there.get(0).getFileName() + "). Replace them?", ButtonType.CANCEL,
                    ButtonType.OK);
            ask.setHeaderText("Replace existing letters");
            ask.initOwner(root.getScene().getWindow());
            if (ask.showAndWait().orElse(ButtonType.CANCEL) != ButtonType.OK) {
                return;
            }
        }
        vm.runner().run("Writing letters", progress -> org.shapetrail.letters.LetterBatch.write(composer, people,
                folder.toPath(), true, "confirm", (done, total) -> progress.update(done, total, "Letter " + done + " of "
                        + total), progress::isCancelled), result -> {
                    vm.statusProperty().set("Wrote " + result.letters().size() + " letter(s) to " + folder);
                    vm.errorProperty().set(String.join(" ", result.refused()));
                }, t -> vm.errorProperty().set(Errors.describe(t)));
    }

    private void personForm(org.shapetrail.store.Person editing) {
        Loaded l = vm.loadedProperty().get();
        if (l == null) {
            return;
        }
        PersonFormView.show(new PersonFormViewModel(l.file(), l.builder().academy().squads(), locale, editing),
                root.getScene().getWindow()).ifPresent(p -> vm.reload());
    }

    private void importFile() {
        Loaded l = vm.loadedProperty().get();
        if (l == null) {
            return;
        }
        FileChooser fc = new FileChooser();
        fc.setTitle("A spreadsheet saved as CSV");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("CSV files", "*.csv", "*.txt"));
        var f = fc.showOpenDialog(root.getScene().getWindow());
        if (f == null) {
            return;
        }
        try {
            new ImportWizardView(new ImportWizardViewModel(l.file(), f.toPath()), vm.runner(),
                    root.getScene().getWindow(), vm::reload).show();
        } catch (java.io.IOException | RuntimeException e) {
            vm.errorProperty().set("The file " + f.getName() + " cannot be read: " + Errors.describe(e));
        }
    }

    private void chooseNewFile() {
        FileChooser fc = new FileChooser();
        fc.setTitle("A new, empty Shapetrail file");
        fc.setInitialFileName("academy.sqlite");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Shapetrail files", "*.sqlite"));
        var f = fc.showSaveDialog(root.getScene().getWindow());
        if (f != null) {
            vm.createAndOpen(f.toPath());
        }
    }

    private void chooseFile() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Open a Shapetrail file");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Shapetrail files", "*.sqlite", "*.db"));
        var f = fc.showOpenDialog(root.getScene().getWindow());
        if (f != null) {
            vm.open(f.toPath());
        }
    }

    /** Opens the entry window for a new visit (or an edit) of the selected person. */
    VisitEntryView entryFor(Visit editing) {
        PersonHistory h = vm.selectedHistory().orElseThrow();
        Loaded l = vm.loadedProperty().get();
        return new VisitEntryView(new VisitEntryViewModel(l.file(), l.builder(), h, locale, editing),
                root.getScene().getWindow());
    }

    void enterVisit(Visit editing) {
        if (vm.selectedHistory().isEmpty()) {
            return;
        }
        entryFor(editing).showAndWait().ifPresent(v -> vm.reload());
    }

    private Optional<Visit> stored(VisitLine line) {
        Loaded l = vm.loadedProperty().get();
        return l.builder().academy().visits().stream().filter(v -> v.id() == line.visitId()).findFirst();
    }

    private void editVisit(VisitLine line) {
        stored(line).ifPresent(shown -> {
            Path file = vm.loadedProperty().get().file();
            Optional<VisitSnapshot> before;
            try {
                before = OffFxThread.call(storing, () -> VisitSnapshot.read(file, shown.id()));
            } catch (RuntimeException e) {
                vm.errorProperty().set("The visit cannot be edited now: " + Errors.describe(e));
                return;
            }
            Optional<Visit> after = entryFor(shown).showAndWait();
            if (after.isPresent() && before.isPresent()) {
                pushUndo("the edit of the visit of " + line.date(), () -> before.get().restoreEdited(file));
                vm.reload();
            }
        });
    }

    private void deleteVisit(VisitLine line) {
        stored(line).ifPresent(v -> {
            Alert a = new Alert(Alert.AlertType.CONFIRMATION, "Delete the visit of " + line.date() + " with all its"
                    + " trials? You can undo this until you close Shapetrail.", ButtonType.CANCEL, ButtonType.OK);
            a.setHeaderText("Delete visit");
            a.initOwner(root.getScene().getWindow());
            if (a.showAndWait().orElse(ButtonType.CANCEL) != ButtonType.OK) {
                return;
            }
            Path file = vm.loadedProperty().get().file();
            Optional<VisitSnapshot> before;
            try {
                before = OffFxThread.call(storing, () -> {
                    Optional<VisitSnapshot> snap = VisitSnapshot.read(file, v.id());
                    try (Database db = Database.openExisting(file)) {
                        db.inTransaction(tx -> tx.visits().delete(v.id()));
                    }
                    return snap;
                });
            } catch (RuntimeException e) {
                vm.errorProperty().set("The visit was not deleted: " + Errors.describe(e));
                return;
            }
            before.ifPresent(b -> pushUndo("the deletion of the visit of " + line.date(), () -> b.restoreDeleted(file)));
            vm.reload();
        });
    }

    private void pushUndo(String what, Runnable action) {
        undo.push(action);
        person.undo.setText("Undo " + what);
        person.undo.setDisable(false);
    }

    private void undoLast() {
        Runnable r = undo.poll();
        if (r != null) {
            try {
                OffFxThread.call(storing, () -> {
                    r.run();
                    return null;
                });
            } catch (RuntimeException e) {
                undo.push(r); // still there to try again
                vm.errorProperty().set("Nothing was undone: " + Errors.describe(e));
            }
            vm.reload();
        }
        person.undo.setText("Undo last change");
        person.undo.setDisable(undo.isEmpty());
    }

    public Parent root() {
        return root;
    }

    public WorkbenchViewModel viewModel() {
        return vm;
    }

    public PersonPane personPane() {
        return person;
    }

    public TabPane pages() {
        return pages;
    }

    public ComboBox<String> squadChoice() {
        return squadChoice;
    }
}
