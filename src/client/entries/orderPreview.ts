/** Page script of the OrderPreview component: the previews of the orders not published (orderPreview.ts). */
import { mountOrderPreview } from '../orderPreview.ts';

void mountOrderPreview();
