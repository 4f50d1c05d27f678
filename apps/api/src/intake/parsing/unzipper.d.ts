// The part of unzipper (a dependency of exceljs) that Intake uses to read a workbook's table of contents.
declare module 'unzipper' {
  export interface CentralDirectoryFile {
    path: string;
    uncompressedSize: number;
    type: 'File' | 'Directory';
    buffer(): Promise<Buffer>;
  }
  export interface CentralDirectory {
    files: CentralDirectoryFile[];
  }
  export const Open: {
    file(path: string): Promise<CentralDirectory>;
    buffer(data: Buffer): Promise<CentralDirectory>;
  };
}
