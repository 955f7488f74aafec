package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Locale;
import java.util.function.Consumer;
import javafx.beans.property.SimpleStringProperty;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.shapetrail.chart.fx.ChartCanvas;
import org.shapetrail.history.PersonHistory;

/** The person page: profile with cautions, the verdict of the latest change, the visit table and the chart. */
public final class PersonPane extends BorderPane {
    private final Label title = new Label(tr("person.choose"));
    private final VBox profile = new VBox(3);
    private final Label latest = new Label();
    private final TableView<VisitLine> visits = new TableView<>();
    private final ChartCanvas chart = new ChartCanvas();
    private final ChartCanvas growth = new ChartCanvas();
    private SomatotypeSpaceView space;
    private java.util.List<org.shapetrail.somatotype.Rating> spaceRatings = java.util.List.of();
    private final javafx.scene.control.TabPane views = new javafx.scene.control.TabPane();
    private final SplitPane split;
    private final javafx.scene.control.CheckBox regions = new javafx.scene.control.CheckBox(tr("person.regions"));
    private PersonHistory shown;
    private Locale shownLocale = Locale.getDefault();
    final Button newVisit = new Button(tr("person.newVisit"));
    final Button editVisit = new Button(tr("person.editVisit"));
    final Button deleteVisit = new Button(tr("person.deleteVisit"));
    final Button visitHistory = new Button(tr("person.visitHistory"));
    final Button undo = new Button(tr("person.undo"));
    final Button previewLetter = new Button(tr("person.previewLetter"));
    final Button editPerson = new Button(tr("person.editPerson"));
    final Button moveSquad = new Button(tr("person.moveSquad"));

    public PersonPane() {
        setId("person-page");
        title.setId("person-title");
        title.getStyleClass().add("page-title");
        latest.setId("latest-change");
        latest.setWrapText(true);
        latest.getStyleClass().add("verdict-line");
        visits.setId("visits");
        chart.setId("person-chart");
        newVisit.setId("new-visit");
        editVisit.setId("edit-visit");
        deleteVisit.setId("delete-visit");
        visitHistory.setId("visit-history");
        visitHistory.setTooltip(new javafx.scene.control.Tooltip(tr("person.visitHistory.tip")));
        undo.setId("undo");
        previewLetter.setId("preview-letter");
        editPerson.setId("edit-person");
        moveSquad.setId("move-squad");
        column(tr("person.col.date"), VisitLine::date, 125);
        column(tr("person.col.age"), VisitLine::age, 50);
        column(tr("person.col.measurer"), VisitLine::measurer, 120);
        column(tr("person.col.context"), VisitLine::context, 110);
        column(tr("person.col.stature"), VisitLine::stature, 80);
        column(tr("person.col.mass"), VisitLine::mass, 70);
        column(tr("person.col.somatotype"), VisitLine::rating, 100);
        column(tr("person.col.category"), VisitLine::category, 150);
        column(tr("person.col.moved"), VisitLine::change, 85);
        column(tr("person.col.multiple"), VisitLine::verdict, 170);
        visits.setPlaceholder(new Label(tr("person.noVisits")));
        editVisit.disableProperty().bind(visits.getSelectionModel().selectedItemProperty().isNull());
        deleteVisit.disableProperty().bind(visits.getSelectionModel().selectedItemProperty().isNull());
        visitHistory.disableProperty().bind(visits.getSelectionModel().selectedItemProperty().isNull());
        // the buttons wrap onto a second row rather than lose their words when the page is narrow
        javafx.scene.layout.FlowPane actions = new javafx.scene.layout.FlowPane(8, 6, newVisit, editVisit, deleteVisit,
                undo, visitHistory, new javafx.scene.control.Separator(javafx.geometry.Orientation.VERTICAL), previewLetter, editPerson,
                moveSquad);
        actions.getChildren().forEach(n -> {
            if (n instanceof Button b) {
                b.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            }
        });
        VBox head = new VBox(6, title, profile, latest, actions);
        head.setPadding(new Insets(10, 12, 8, 12));
        setTop(head);
        Label key = new Label(tr("person.chart.key"));
        key.setId("chart-key");
        key.setWrapText(true);
        key.getStyleClass().add("hint");
        regions.setId("category-regions");
        regions.selectedProperty().addListener((o, a, b) -> {
            if (shown != null) {
                showChart();
            }
        });
        BorderPane chartBox = new BorderPane(chart);
        chartBox.setBottom(new VBox(2, key, regions));
        growth.setId("growth-chart");
        javafx.scene.control.Tab somato = new javafx.scene.control.Tab(tr("person.tab.somatochart"), chartBox);
        javafx.scene.control.Tab growthTab = new javafx.scene.control.Tab(tr("person.tab.growth"), growth);
        javafx.scene.control.Tab spaceTab = new javafx.scene.control.Tab(tr("person.tab.space"));
        // the 3D scene is built when first shown: most sessions never open it, and it costs start-up time
        spaceTab.selectedProperty().addListener((o, a, b) -> {
            if (b && space == null) {
                space = new SomatotypeSpaceView();
                spaceTab.setContent(space);
                space.show(spaceRatings);
            }
        });
        views.getTabs().addAll(somato, growthTab, spaceTab);
        views.setTabClosingPolicy(javafx.scene.control.TabPane.TabClosingPolicy.UNAVAILABLE);
        views.setId("person-views");
        split = new SplitPane(visits, views);
        split.setDividerPositions(0.5);
        // the table and charts join the scene with the first person shown: a lighter first frame
        Label choose = new Label(tr("person.choose.long"));
        choose.getStyleClass().add("hint");
        choose.setPadding(new Insets(20));
        setCenter(choose);
        chart.setMinSize(320, 320);
        VBox.setVgrow(split, Priority.ALWAYS);
        chart.setOnSelect(id -> {
            long visitId = Long.parseLong(id.substring("visit:".length()));
            visits.getItems().stream().filter(v -> v.visitId() == visitId).findFirst().ifPresent(v -> {
                visits.getSelectionModel().select(v);
                visits.scrollTo(v);
            });
        });
    }

    private void column(String name, java.util.function.Function<VisitLine, String> f, double width) {
        TableColumn<VisitLine, String> c = new TableColumn<>(name);
        c.setCellValueFactory(d -> new SimpleStringProperty(f.apply(d.getValue())));
        c.setPrefWidth(width);
        visits.getColumns().add(c);
    }

    /** Shows a person's history. */
    public void show(PersonHistory h, String squad, Locale locale) {
        if (getCenter() != split) {
            setCenter(split);
        }
        PersonPage page = PersonPage.of(h, squad, locale);
        title.setText(page.title());
        profile.getChildren().clear();
        for (String line : page.profile()) {
            Label l = new Label(line);
            l.setWrapText(true);
            l.getStyleClass().add(line.endsWith(PersonPage.rapidMark()) ? "alert-line" : "profile-line");
            profile.getChildren().add(l);
        }
        latest.setText(page.latestChange());
        latest.getStyleClass().removeAll("beyond", "borderline", "within");
        h.latestChange().ifPresent(c -> latest.getStyleClass().add(switch (c.verdict().verdict()) {
            case BEYOND_NOISE -> "beyond";
            case BORDERLINE -> "borderline";
            case WITHIN_NOISE -> "within";
        }));
        visits.getItems().setAll(page.visits());
        shown = h;
        shownLocale = locale;
        showChart();
        growth.setModel(org.shapetrail.chart.Charts.growth(h));
        spaceRatings = h.rated().stream().map(r -> r.somatotype().rating()).toList();
        if (space != null) {
            space.show(spaceRatings);
        }
    }

    /** The migration path, its date labels laid out for the size the chart is drawn at. */
    private void showChart() {
        PersonHistory h = shown;
        Locale l = shownLocale;
        boolean withRegions = regions.isSelected();
        chart.setLayout(height -> org.shapetrail.chart.Charts.migration(h, true, l, false, withRegions, height));
    }

    public TableView<VisitLine> visitsTable() {
        return visits;
    }

    public ChartCanvas chart() {
        return chart;
    }

    public javafx.scene.control.TabPane views() {
        return views;
    }

    public SomatotypeSpaceView space() {
        return space;
    }

    void onNewVisit(Runnable r) {
        newVisit.setOnAction(e -> r.run());
    }

    void onEditVisit(Consumer<VisitLine> c) {
        editVisit.setOnAction(e -> c.accept(visits.getSelectionModel().getSelectedItem()));
    }

    void onVisitHistory(Consumer<VisitLine> c) {
        visitHistory.setOnAction(e -> c.accept(visits.getSelectionModel().getSelectedItem()));
    }

    void onDeleteVisit(Consumer<VisitLine> c) {
        deleteVisit.setOnAction(e -> c.accept(visits.getSelectionModel().getSelectedItem()));
    }
}
