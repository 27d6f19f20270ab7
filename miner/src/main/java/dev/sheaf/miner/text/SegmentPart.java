package dev.sheaf.miner.text;

/** Which text of a field a segment comes from; spec keys and values are analysed apart. */
public enum SegmentPart {
    /** The field text of a title, heading, description, bullet or text field. */
    TEXT,
    /** The key of a spec row ("Weight"); offsets are into {@code Field.key()}. */
    SPEC_KEY,
    /** The value of a spec row ("1.2 kg"); offsets are into {@code Field.text()}. */
    SPEC_VALUE
}
