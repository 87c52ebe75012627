/** A LIKE pattern matching `text` anywhere, with its wildcards escaped: a search for "50%" means the text "50%". */
export const likeContains = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
