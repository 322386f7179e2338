/** A file the person chose: the web's File when there is one, otherwise a local URI (native). */
export type ChosenFile = { uri: string; name: string; mimeType: string; file?: Blob };
