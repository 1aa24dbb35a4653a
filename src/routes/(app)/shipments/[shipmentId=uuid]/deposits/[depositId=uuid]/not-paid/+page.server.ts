// Same as the paid return page: the state the webhook has recorded, nothing decided here.
export { load } from '../paid/+page.server';
