/** The caution shown wherever lithium-battery guidance appears (screens, e-mails, PDFs). */
export const DANGEROUS_GOODS_CAUTION =
	'Guidance only. Landfall prepares no dangerous-goods declaration. Only staff trained for the mode of transport may classify, pack, mark and label dangerous goods and prepare and sign a dangerous-goods declaration. The IATA Dangerous Goods Regulations, the IMDG Code, ADR and the carrier’s own rules decide, in their current editions.';
