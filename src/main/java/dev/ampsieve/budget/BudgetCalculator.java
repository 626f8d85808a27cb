package dev.ampsieve.budget;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;

/** THROWAWAY STUB so branch 'search' compiles before branch 'engine' lands; reverted before merging main. */
public final class BudgetCalculator {
    private BudgetCalculator() {
    }

    public static Budget compute(Stage stage, Part part) {
        throw new UnsupportedOperationException("budget engine: in progress");
    }
}
