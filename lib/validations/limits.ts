/*
 * Text limits of a configuration document, without zod: the forms, the designer and the
 * data-access layer read them from here, so a page that only needs a number never loads the
 * schemas.
 */

/**
 * The longest configuration title, in characters after trimming. The one limit for the document
 * schema, the API bodies that carry a title, the forms and the data-access layer.
 */
export const configurationTitleMaxLength = 200;

/** The longest stack label, in characters. */
export const stackLabelMaxLength = 120;

/** The longest configuration description, in characters. */
export const configurationDescriptionMaxLength = 5000;
