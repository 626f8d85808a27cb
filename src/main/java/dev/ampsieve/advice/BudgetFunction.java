package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;

/**
 * Computes one part's budget in one stage; {@code BudgetCalculator::compute} in the tool.
 * Advice re-runs it on modified stages to find what change would make a part fit.
 */
@FunctionalInterface
public interface BudgetFunction {
    Budget compute(Stage stage, Part part);
}
