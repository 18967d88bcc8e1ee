import { PageHeader } from '../../components/page-header';
import { CertificatesGrid } from '../../features/certificates/components/certificates-grid';

export function CertificatesRoute() {
  return (
    <>
      <PageHeader
        title="Certificates"
        description="Certificates of conformance issued for sold sets. The number downloads the PDF; the code opens the public check the customer sees."
      />
      <CertificatesGrid />
    </>
  );
}
