/**
 * A piece of cost in its own currency (a base freight, one surcharge, one brokerage fee), with the
 * words of its trail step. The engine converts pieces to the report and customs currencies.
 */
import type Decimal from 'decimal.js';
import type { Context } from './context';
import { money } from './decimal';

export interface Piece {
	key: string;
	label: string;
	amount: Decimal;
	currency: string;
	formula: string;
	inputs: { label: string; value: string }[];
	rowId?: string;
	source?: string;
}

/** Writes the piece's trail step (in its own currency). */
export function tracePiece(ctx: Context, piece: Piece): void {
	ctx.step({
		key: piece.key,
		label: piece.label,
		amount: money(piece.amount, piece.currency),
		currency: piece.currency,
		formula: piece.formula,
		inputs: piece.inputs,
		rowId: piece.rowId,
		source: piece.source
	});
}
