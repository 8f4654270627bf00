package org.convgrid.engine.request;

import java.util.Objects;

/**
 * One model a grid asks for, cgs units.
 *
 * @param modelId stable key built from the grid indices
 * @param mass total mass, g
 * @param initialMetals initial metal mass fraction Z
 * @param initialHelium initial helium mass fraction Y
 * @param age the age asked for, with its origin and unit
 * @param physics the physics options of this model
 */
public record ModelRequest(String modelId, double mass, double initialMetals, double initialHelium, Age age,
                           PhysicsOptions physics) {

    public ModelRequest {
        Objects.requireNonNull(age, "age");
    }

    /** A request at {@code seconds} since the zero-age main sequence. */
    public ModelRequest(String modelId, double mass, double initialMetals, double initialHelium, double seconds,
                        PhysicsOptions physics) {
        this(modelId, mass, initialMetals, initialHelium, new Age.SinceZeroAge(seconds), physics);
    }

    /** The same request at another age. */
    public ModelRequest withAge(Age other) {
        return new ModelRequest(modelId, mass, initialMetals, initialHelium, other, physics);
    }

    /** The same request under another id. */
    public ModelRequest withModelId(String other) {
        return new ModelRequest(other, mass, initialMetals, initialHelium, age, physics);
    }
}
