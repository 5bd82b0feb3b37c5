package org.variset.archive.settings;

/** What one setting value applies to. */
public enum SettingScope {
    /** The whole gym. */
    GYM,
    /** One discipline of the gym (boulder or rope). */
    DISCIPLINE,
    /** One discipline, or one wall (a wall's value comes first). */
    DISCIPLINE_OR_WALL
}
