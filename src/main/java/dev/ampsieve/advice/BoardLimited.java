package dev.ampsieve.advice;

import dev.ampsieve.budget.TermResult;
import dev.ampsieve.stage.Board;

/**
 * The pick's largest term comes from the board, not the part: a better part would not remove it,
 * the layout would ({@code report} names the lever by the term's key).
 *
 * @param term   the board-level term
 * @param limitV the stage limit at the output, V
 * @param board  the stage's board (junction count for the thermal-EMF lever)
 */
public record BoardLimited(TermResult term, double limitV, Board board) {}
