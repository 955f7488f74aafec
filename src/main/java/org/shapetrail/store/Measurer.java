package org.shapetrail.store;

/** A person who takes measurements, with their accreditation level as they state it (e.g. "ISAK level 2"). */
public record Measurer(long id, String name, String accreditation) {
    public Measurer {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a measurer needs a name");
        }
        accreditation = accreditation == null ? "" : accreditation;
    }
}
