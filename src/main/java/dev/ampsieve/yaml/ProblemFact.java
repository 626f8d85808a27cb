package dev.ampsieve.yaml;

/**
 * What a loader found, as facts in place of a problem's words: which rule a value broke and the
 * numbers involved, each with its {@code units.Dimension}. Each loader has its own sealed type of
 * facts ({@code stage.StageFact}, {@code catalog.CatalogFact}); {@code report.ProblemText} is the
 * one place that words them, so no package below {@code report} formats a number for a message.
 * (A sealed interface here could not list records of other packages, so this one is open.)
 */
public interface ProblemFact {}
