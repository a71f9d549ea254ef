import { CATEGORY_LABELS, type ModelCategory } from '#shared/schemas/models.ts';

/** "panel" → "Panel"; a category the client does not know yet is shown as sent. */
export function categoryLabel(category: string): string {
  return CATEGORY_LABELS[category as ModelCategory] ?? category;
}
