import { countryOptions } from '../../reference/countries';
import { currencyOptions } from '../../reference/currencies';

/** Select options for country and currency fields (ISO 3166-1 and ISO 4217). */
export function countryAndCurrencyOptions() {
	return {
		countries: countryOptions(),
		currencies: currencyOptions().map((c) => ({ code: c.code, name: c.name }))
	};
}
