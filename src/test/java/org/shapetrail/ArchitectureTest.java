package org.shapetrail;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The layering rule of DESIGN.md §2: the core knows nothing of JavaFX, SQL, PDF or the outer layers. */
class ArchitectureTest {
    static final String[] CORE = {"org.shapetrail.measure..", "org.shapetrail.somatotype..", "org.shapetrail.noise..",
        "org.shapetrail.growth..", "org.shapetrail.groups.."};

    static JavaClasses classes;

    @BeforeAll
    static void load() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.shapetrail");
    }

    @Test
    void coreImportsNoJavaFxSqlOrPdf() {
        ArchRule rule = noClasses().that().resideInAnyPackage(CORE).should().dependOnClassesThat()
                .resideInAnyPackage("javafx..", "java.sql..", "javax.sql..", "org.apache.pdfbox..", "org.sqlite..",
                        "org.controlsfx..", "picocli..", "org.apache.commons.csv..");
        rule.check(classes);
    }

    @Test
    void coreDoesNotReachOutwards() {
        ArchRule rule = noClasses().that().resideInAnyPackage(CORE).should().dependOnClassesThat()
                .resideInAnyPackage("org.shapetrail.app..", "org.shapetrail.cli..", "org.shapetrail.store..",
                        "org.shapetrail.chart..", "org.shapetrail.letters..", "org.shapetrail.exchange..");
        rule.check(classes);
    }

    @Test
    void innerLayersDoNotDependOnTheDesktopOrCommandLine() {
        ArchRule rule = noClasses().that().resideInAnyPackage("org.shapetrail.store..", "org.shapetrail.history..",
                "org.shapetrail.chart", "org.shapetrail.chart.svg..", "org.shapetrail.chart.png..",
                "org.shapetrail.chart.pdf..", "org.shapetrail.letters..", "org.shapetrail.exchange..")
                .should().dependOnClassesThat().resideInAnyPackage("org.shapetrail.app..", "org.shapetrail.cli..");
        rule.check(classes);
    }

    @Test
    void onlyTheScreenRendererAndTheAppUseJavaFx() {
        ArchRule rule = noClasses().that().resideInAnyPackage("org.shapetrail.store..", "org.shapetrail.history..",
                "org.shapetrail.chart", "org.shapetrail.chart.svg..", "org.shapetrail.chart.png..",
                "org.shapetrail.chart.pdf..", "org.shapetrail.letters..", "org.shapetrail.exchange..",
                "org.shapetrail.cli..").should().dependOnClassesThat().resideInAnyPackage("javafx..");
        rule.check(classes);
    }
}
