package dev.sheaf.miner.report;

/** Something a {@link Section} holds: a paragraph, a figure, a table or an attribute card. */
public sealed interface Block permits Paragraph, Figure, ReportTable, AttributeCard {
}
