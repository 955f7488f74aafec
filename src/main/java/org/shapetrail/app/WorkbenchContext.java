package org.shapetrail.app;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.function.BiFunction;
import java.util.function.LongConsumer;
import java.util.function.Supplier;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.scene.control.TextInputDialog;
import javafx.stage.Window;
import org.shapetrail.store.Person;

/**
 * What every page of the workbench shares: the state (the view model), the reader's locale, the window
 * that owns dialogs, the flag that takes input away while something is written, and the actions more than
 * one page offers (organising changes, the person form, showing a person).
 */
final class WorkbenchContext {
    final WorkbenchViewModel vm;
    final Locale locale;
    private final Supplier<Window> window;
    /** True while something is being written: the window takes no input meanwhile. */
    final BooleanProperty storing = new SimpleBooleanProperty();
    private LongConsumer showPerson = id -> { };
    private java.util.function.Consumer<Locale> speak = l -> { };
    /** True once the window has a newer workbench (another language): this one then ignores the state. */
    private boolean retired;

    WorkbenchContext(WorkbenchViewModel vm, Locale locale, Supplier<Window> window) {
        this.vm = vm;
        this.locale = locale;
        this.window = window;
    }

    Window window() {
        return window.get();
    }

    /** The open file as read, or null before one is open. */
    Loaded loaded() {
        return vm.loadedProperty().get();
    }

    /** What choosing a language does: the window is built again in it, on the same page. */
    void onSpeak(java.util.function.Consumer<Locale> c) {
        speak = c;
    }

    void speak(Locale locale) {
        speak.accept(locale);
    }

    void retire() {
        retired = true;
    }

    /** False once this workbench has been replaced: its listeners on the shared state then do nothing. */
    boolean live() {
        return !retired;
    }

    void onShowPerson(LongConsumer c) {
        showPerson = c;
    }

    /** Selects the person and brings their page forward. */
    void showPerson(long personId) {
        showPerson.accept(personId);
    }

    /** Asks for one name, then makes the organising change off the FX thread; a refusal is shown as it is. */
    void askAndOrganise(String title, String prompt, BiFunction<org.shapetrail.store.RecordSource, String, Optional<String>> change) {
        Loaded l = loaded();
        if (l == null) {
            return;
        }
        TextInputDialog d = new TextInputDialog();
        Buttons.cancelAndOk(d);
        d.setTitle(title);
        d.setHeaderText(prompt);
        d.initOwner(window());
        d.showAndWait().ifPresent(name -> organise(() -> change.apply(l.source(), name)));
    }

    /**
     * Makes a change off the FX thread; a refusal goes to the error line, success reloads the file.
     *
     * @return true when the change was made
     */
    boolean organise(Supplier<Optional<String>> change) {
        Optional<String> refused;
        try {
            refused = OffFxThread.call(storing, change::get);
        } catch (RuntimeException e) {
            refused = Optional.of(Errors.describe(e));
        }
        if (refused.isPresent()) {
            vm.errorProperty().set(refused.get());
            return false;
        }
        vm.errorProperty().set("");
        vm.reload();
        return true;
    }

    /** The form for a new person (null) or for editing one. */
    void personForm(Person editing) {
        Loaded l = loaded();
        if (l == null) {
            return;
        }
        PersonFormView.show(new PersonFormViewModel(l.source(), l.builder().academy().squads(), locale, editing),
                window()).ifPresent(p -> vm.reload());
    }
}
