package org.shapetrail.store;

/** A squad, team or cohort; people belong to it for dated periods. */
public record Squad(long id, String name) {
    public Squad {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a squad needs a name");
        }
    }
}
