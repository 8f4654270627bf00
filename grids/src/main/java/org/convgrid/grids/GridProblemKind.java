package org.convgrid.grids;

/** What is wrong at one place of a grid file; tests and tools check the kind, the message is for people. */
public enum GridProblemKind {
    /** The text is not UTF-8 or not YAML. */
    SYNTAX,
    /** A key the section does not know (or a key that is not a plain name). */
    UNKNOWN_KEY,
    /** A key or a value given twice. */
    DUPLICATE,
    /** A required section or key is absent (or the file is empty). */
    MISSING_KEY,
    /** Keys that cannot be combined, or values that do not match each other. */
    CONFLICT,
    /** A value of the wrong type: a list for a mapping, text for a number, a quoted number... */
    WRONG_TYPE,
    /** A number outside its allowed range or order. */
    OUT_OF_RANGE,
    /** A name that is none of the allowed choices. */
    UNKNOWN_CHOICE,
    /** A key earlier versions accepted under another name; the message names the new one. */
    RENAMED_KEY,
    /** A file the grid names (a preset, an opacity table) that cannot be read or used. */
    UNREADABLE_FILE
}
