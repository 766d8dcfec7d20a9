/** Page script of the catalogue (the home page): search, filters and sorting of the list (catalogue.ts). */
import { mountCatalogue } from '../catalogue.ts';

void mountCatalogue();
