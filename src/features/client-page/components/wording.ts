// Plain words and numbers for the client: sizes in centimetres, dates written out, prices as numbers.
import { formatMoney, type MoneySettings } from '../../../../shared/units/money';
import type { ClientPiece } from '../../../../shared/schemas/presentation';
import { decimalCmText } from '../../../../shared/units/piece-size';

export { pieceSizeText } from '../../../../shared/units/piece-size';

/** Shown under every 3D view: what the picture is, and what it is not. */
export const SAFETY_LINE =
  'The 3D view is a picture to help you choose, not a construction drawing. Every measurement is checked on site before anything is ordered or built.';

export const elevationText = (mm: number) => `${decimalCmText(mm)} cm above the floor`;

/** A price in the studio's currency, written the way its locale writes it. */
export const priceText = (price: number, money: MoneySettings) => formatMoney(price, money);

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' });
const momentFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', hour: '2-digit', minute: '2-digit' });
export const dayText = (iso: string) => dayFormat.format(new Date(iso));
export const momentText = (iso: string) => momentFormat.format(new Date(iso));

/**
 * The heading over the selected option's pieces: "In this option", or while comparing the option's
 * own name and the half it is in, so it is plain which of the two it means.
 */
export const piecesHeading = (comparing: { label: string; side: 'left' | 'right' } | null) =>
  comparing ? `In ${comparing.label} (${comparing.side})` : 'In this option';

/** The button that chooses the selected option; while comparing it names the option. */
export const chooseLabel = (comparingLabel: string | null) =>
  comparingLabel ? `Choose ${comparingLabel}` : 'Choose this option';

export const pieceName = (piece: Pick<ClientPiece, 'name'>) => piece.name.trim() || 'Unnamed piece';

/** The page's width and side margins, shared by the header and the room so their edges line up. */
export const PAGE_FRAME = 'mx-auto w-full max-w-[100rem] px-4 sm:px-6';
