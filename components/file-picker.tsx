import { Small } from './ui';

/** Files are chosen in the web app; a native build would use a document picker here. */
export function FilePicker(_props: { label: string; accept: string; onPick: (file: File) => void; testID?: string }) {
  return <Small>Upload files from the web app.</Small>;
}
